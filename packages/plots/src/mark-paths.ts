import { formatCoordinate as f } from './format-coordinate.js';

// The trade's pole-zero map marks, as SVG paths both renderers accept
// (pdfkit's path parser reads M, L, A and Z).

/** A pole: an x of two strokes through (x, y), half-size r. */
export function crossPath(x: number, y: number, r: number): string {
  return `M${f(x - r)},${f(y - r)}L${f(x + r)},${f(y + r)}M${f(x - r)},${f(y + r)}L${f(x + r)},${f(y - r)}`;
}

/** A zero or a ring: a circle of radius r about (x, y), drawn as two half arcs and closed. */
export function circlePath(x: number, y: number, r: number): string {
  return `M${f(x + r)},${f(y)}A${f(r)},${f(r)},0,1,1,${f(x - r)},${f(y)}A${f(r)},${f(r)},0,1,1,${f(x + r)},${f(y)}Z`;
}

/** A small triangle at (x, y) pointing left, right, up or down: a mark for something beyond the plot's edge. */
export function arrowPath(x: number, y: number, r: number, direction: 'left' | 'right' | 'up' | 'down'): string {
  const pts =
    direction === 'left'
      ? [[x, y], [x + 1.6 * r, y - r], [x + 1.6 * r, y + r]]
      : direction === 'right'
        ? [[x, y], [x - 1.6 * r, y - r], [x - 1.6 * r, y + r]]
        : direction === 'up'
          ? [[x, y], [x - r, y + 1.6 * r], [x + r, y + 1.6 * r]]
          : [[x, y], [x - r, y - 1.6 * r], [x + r, y - 1.6 * r]];
  return `M${pts.map(([a, b]) => `${f(a!)},${f(b!)}`).join('L')}Z`;
}

/** An axis-parallel rectangle, closed. */
export function rectPath(x: number, y: number, width: number, height: number): string {
  return `M${f(x)},${f(y)}L${f(x + width)},${f(y)}L${f(x + width)},${f(y + height)}L${f(x)},${f(y + height)}Z`;
}
