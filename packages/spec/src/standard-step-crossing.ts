import { findRootBracketed } from './find-root-bracketed.js';
import { standardStepResponse } from './standard-step-response.js';

// First time the standard second-order step response (omega_n = 1) reaches
// `level`, 0 < level <= 1 (level 1 only when underdamped, else NaN), by
// Brent's method on the analytic response. The response rises monotonically from 0 up to its first peak (at pi / omega_d
// when underdamped, never after it otherwise), so a bracket [lo, hi] with
// y(lo) < level <= y(hi) found by doubling, capped at the first peak, holds
// exactly one crossing.
export function standardStepCrossing(zeta: number, level: number): number {
  if (!(zeta >= 0) || !(level > 0 && level <= 1) || (level === 1 && zeta >= 1)) return Number.NaN;
  const y = (t: number): number => standardStepResponse(zeta, t).y - level;
  const firstPeak = zeta < 1 ? Math.PI / Math.sqrt(1 - zeta * zeta) : Number.POSITIVE_INFINITY;
  let lo = 0;
  let hi = Math.min(1, firstPeak);
  while (y(hi) < 0) {
    lo = hi;
    hi = Math.min(2 * hi, firstPeak);
  }
  return findRootBracketed(y, lo, hi);
}
