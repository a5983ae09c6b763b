// How close to the imaginary axis a pole must be to count as on it
// (marginally stable, or at the origin): |Re p| <= 1e-9 * max |p_i|. A pole
// this slow next to the model's fastest one would take more than 1e9 of the
// fastest time constants to settle, so treating it as not decaying at all is
// the honest reading; it also absorbs the round-off of root finding
// (about 1e-16 of the largest root).
import type { Complex } from './types.js';
import { magnitude } from './magnitude.js';

export const AXIS_RELATIVE_TOLERANCE = 1e-9;

export function axisTolerance(poles: readonly Complex[]): number {
  let s = 0;
  for (const p of poles) s = Math.max(s, magnitude(p.re, p.im));
  return AXIS_RELATIVE_TOLERANCE * s;
}
