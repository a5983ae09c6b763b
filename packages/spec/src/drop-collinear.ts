import type { Complex } from './types.js';

/**
 * Removes the points of a polyline that lie on the straight segment between
 * their neighbours, up to rounding (`relTol` of the coordinates' size): a
 * region edge along a straight limit (the decay-rate line, a damping ray)
 * keeps its two ends instead of hundreds of samples, while curved edges keep
 * every point. A point where the line turns back on itself is kept. The first
 * and last points always stay.
 */
export function dropCollinear(points: Complex[], relTol = 1e-12): Complex[] {
  if (points.length < 3) return points.slice();
  const out: Complex[] = [points[0] as Complex];
  for (let i = 1; i + 1 < points.length; i++) {
    const a = out[out.length - 1] as Complex;
    const p = points[i] as Complex;
    const b = points[i + 1] as Complex;
    const abx = b.re - a.re;
    const aby = b.im - a.im;
    const apx = p.re - a.re;
    const apy = p.im - a.im;
    const len = Math.hypot(abx, aby);
    const scale = Math.max(Math.abs(a.re), Math.abs(a.im), Math.abs(b.re), Math.abs(b.im), Math.abs(p.re), Math.abs(p.im), Number.MIN_VALUE);
    // distance of p from the line through a and b, and whether p lies between them
    const off = len > 0 ? Math.abs(abx * apy - aby * apx) / len : Math.hypot(apx, apy);
    const along = apx * abx + apy * aby;
    const between = along >= 0 && along <= len * len;
    if (!(off <= relTol * scale && between)) out.push(p);
  }
  out.push(points[points.length - 1] as Complex);
  return out;
}
