import type { Frame, Margin } from './types.js';

export const DEFAULT_MARGIN: Margin = { top: 12, right: 14, bottom: 40, left: 52 };

/** The plotting area of a width x height box once the margins (axes, tick labels) are taken off. */
export function plotFrame(width: number, height: number, margin: Partial<Margin> = {}): Frame {
  const m = { ...DEFAULT_MARGIN, ...margin };
  return { x: m.left, y: m.top, width: Math.max(1, width - m.left - m.right), height: Math.max(1, height - m.top - m.bottom) };
}
