import { curveLinear, curveLinearClosed, line } from 'd3-shape';

import type { Point } from './types.js';

const open = line<Point>()
  .x((p) => p.x)
  .y((p) => p.y)
  .defined((p) => Number.isFinite(p.x) && Number.isFinite(p.y))
  .curve(curveLinear)
  .digits(2);

const closed = line<Point>()
  .x((p) => p.x)
  .y((p) => p.y)
  .defined((p) => Number.isFinite(p.x) && Number.isFinite(p.y))
  .curve(curveLinearClosed)
  .digits(2);

/**
 * An SVG path through the points (d3-shape's line generator); `close` ends it
 * with Z. Fewer than two points give an empty string.
 */
export function polylinePath(points: readonly Point[], close = false): string {
  if (points.length < 2) return '';
  return (close ? closed : open)(points as Point[]) ?? '';
}
