import { overshootFromDamping } from './overshoot-from-damping.js';
import { riseTimeNormalizedFast } from './rise-time-normalized-fast.js';
import { settlingConstant } from './settling-constant.js';
import type { Dominance, Estimate } from './types.js';
import { magnitude } from './magnitude.js';

// The textbook view of a response from its dominant pole(s) alone.
// A complex pair -sigma +/- j omega_d (omega_n, zeta): overshoot
// 100 exp(-zeta pi / sqrt(1 - zeta^2)), peak time pi / omega_d, settling time
// c / sigma (c = 4 for 2 %, 3 for 5 %, ln(100 / band) otherwise) and 10-90 %
// rise time f(zeta) / omega_n with the exact normalized rise time f.
// A real pole p: first-order response 1 - e^{pt}: no overshoot, no peak,
// settling ln(100 / band) / |p|, rise time ln(9) / |p|.
// No dominant pole, or one that does not decay: every estimate is null.
export function secondOrderEstimate(dominance: Dominance, settlingBandPct: number): Estimate {
  const none: Estimate = { overshootPct: null, peakTime: null, settlingTime: null, riseTime: null };
  const p = dominance.poles[0];
  if (p === undefined || !(p.re < 0)) return none;
  const sigma = -p.re;
  const wd = Math.abs(p.im);
  if (wd === 0) {
    return {
      overshootPct: 0,
      peakTime: null,
      settlingTime: Math.log(100 / settlingBandPct) / sigma,
      riseTime: Math.log(9) / sigma,
    };
  }
  const wn = magnitude(sigma, wd);
  const zeta = sigma / wn;
  return {
    overshootPct: overshootFromDamping(zeta),
    peakTime: Math.PI / wd,
    settlingTime: settlingConstant(settlingBandPct) / sigma,
    riseTime: riseTimeNormalizedFast(zeta) / wn,
  };
}
