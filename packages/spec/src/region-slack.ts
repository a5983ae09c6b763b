import { overshootFromDamping } from './overshoot-from-damping.js';
import { riseTimeNormalizedFast } from './rise-time-normalized-fast.js';
import { settlingConstant } from './settling-constant.js';
import { tightenLimits, type Limits } from './tighten-limits.js';
import type { Complex, Requirements } from './types.js';
import { magnitude } from './magnitude.js';

export interface RegionSlack {
  /** Per limit present: limit minus the second-order value (or value minus floor), in the limit's units; >= 0 inside. */
  slack: { [K in keyof Limits]?: number };
  /** The pole lies in the open left half-plane and every slack is >= 0. */
  inside: boolean;
  dampingRatio: number;
  naturalFrequency: number;
}

// How far a dominant pole (or the upper pole of a pair; the sign of im does
// not matter) lies inside each limit of the admissible region, measured in the
// second-order view against the limits tightened by marginPct, as the region
// is drawn: overshoot in %, times in s, damping ratio, natural frequency in
// rad/s. A pole with no finite second-order value (no decay, no oscillation
// for a peak-time limit) gets -Infinity.
export function regionSlack(pole: Complex, req: Requirements): RegionSlack {
  const sigma = -pole.re;
  const wd = Math.abs(pole.im);
  const wn = magnitude(sigma, wd);
  const zeta = wn > 0 ? sigma / wn : 0;
  const limits = tightenLimits(req);
  const slack: RegionSlack['slack'] = {};
  const stable = sigma > 0;

  if (limits.maxOvershootPct !== undefined) {
    slack.maxOvershootPct = stable ? limits.maxOvershootPct - overshootFromDamping(zeta) : Number.NEGATIVE_INFINITY;
  }
  if (limits.minDampingRatio !== undefined) slack.minDampingRatio = zeta - limits.minDampingRatio;
  if (limits.maxSettlingTime !== undefined) {
    const c = settlingConstant(req.settlingBandPct ?? 2);
    slack.maxSettlingTime = stable ? limits.maxSettlingTime - c / sigma : Number.NEGATIVE_INFINITY;
  }
  if (limits.maxPeakTime !== undefined) {
    slack.maxPeakTime = stable && wd > 0 ? limits.maxPeakTime - Math.PI / wd : Number.NEGATIVE_INFINITY;
  }
  if (limits.maxRiseTime !== undefined) {
    slack.maxRiseTime = stable ? limits.maxRiseTime - riseTimeNormalizedFast(zeta) / wn : Number.NEGATIVE_INFINITY;
  }
  if (limits.maxNaturalFrequency !== undefined) slack.maxNaturalFrequency = limits.maxNaturalFrequency - wn;

  const inside = stable && Object.values(slack).every((v) => v >= 0);
  return { slack, inside, dampingRatio: zeta, naturalFrequency: wn };
}
