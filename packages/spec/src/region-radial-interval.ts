import { riseTimeNormalizedFast } from './rise-time-normalized-fast.js';

// The admissible region seen along one ray from the origin. A dominant pole
// s = -r cos(theta) + j r sin(theta), theta in [0, pi/2] measured from the
// negative real axis, has zeta = cos(theta) and omega_n = r. Along such a ray
// every limit is a bound on r alone (decay: r cos >= sigma_min; damped
// frequency: r sin >= omega_d_min; rise time: r >= f(cos) / Tr; ceiling:
// r <= omega_n_max) and a ray meets a rectangle in one interval, so the region
// on each ray is the single interval [lo, hi]; the damping limit only cuts
// theta. `loBy` / `hiBy` say which limit makes each end.

export type RadialBound =
  | 'origin'
  | 'decay'
  | 'dampedFrequency'
  | 'riseTime'
  | 'ceiling'
  | 'viewportReMin'
  | 'viewportReMax'
  | 'viewportImMin'
  | 'viewportImMax'
  | 'none';

export interface RadialLimits {
  minDecayRate: number | null;
  minDampedFrequency: number | null;
  maxRiseTime: number | null;
  maxNaturalFrequency: number | null;
}

export interface Box {
  reMin: number;
  reMax: number;
  imMin: number;
  imMax: number;
}

export interface RadialInterval {
  lo: number;
  hi: number;
  loBy: RadialBound;
  hiBy: RadialBound;
}

export function regionRadialInterval(limits: RadialLimits, theta: number, box: Box | null): RadialInterval {
  const c = Math.cos(theta);
  const s = Math.sin(theta);
  let lo = 0;
  let loBy: RadialBound = 'origin';
  let hi = Number.POSITIVE_INFINITY;
  let hiBy: RadialBound = 'none';
  const raiseLo = (v: number, by: RadialBound): void => {
    if (v > lo) {
      lo = v;
      loBy = by;
    }
  };
  const lowerHi = (v: number, by: RadialBound): void => {
    if (v < hi) {
      hi = v;
      hiBy = by;
    }
  };
  if (limits.minDecayRate !== null) raiseLo(c > 0 ? limits.minDecayRate / c : Number.POSITIVE_INFINITY, 'decay');
  if (limits.minDampedFrequency !== null)
    raiseLo(s > 0 ? limits.minDampedFrequency / s : Number.POSITIVE_INFINITY, 'dampedFrequency');
  if (limits.maxRiseTime !== null) raiseLo(riseTimeNormalizedFast(Math.max(0, c)) / limits.maxRiseTime, 'riseTime');
  if (limits.maxNaturalFrequency !== null) lowerHi(limits.maxNaturalFrequency, 'ceiling');
  if (box !== null) {
    // re = -r c within [reMin, reMax]; im = r s within [imMin, imMax].
    // Each side is its own bound so that the sweep keeps the box's corners.
    if (c > 0) {
      raiseLo(-box.reMax / c, 'viewportReMax');
      lowerHi(-box.reMin / c, 'viewportReMin');
    } else if (!(box.reMin <= 0 && box.reMax >= 0)) lowerHi(-1, 'viewportReMin');
    if (s > 0) {
      raiseLo(box.imMin / s, 'viewportImMin');
      lowerHi(box.imMax / s, 'viewportImMax');
    } else if (!(box.imMin <= 0 && box.imMax >= 0)) lowerHi(-1, 'viewportImMin');
  }
  return { lo, hi, loBy, hiBy };
}
