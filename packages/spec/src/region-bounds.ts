import { dampingFromOvershoot } from './damping-from-overshoot.js';
import { regionSweep } from './region-sweep.js';
import { riseTimeNormalizedFast } from './rise-time-normalized-fast.js';
import { settlingConstant } from './settling-constant.js';
import { tightenLimits, type Limits } from './tighten-limits.js';
import type { Requirements } from './types.js';

export interface RiseTimeCurvePoint {
  dampingRatio: number;
  minNaturalFrequency: number;
}

/**
 * The admissible region's bounds in the second-order view. When marginPct > 0
 * the region is drawn for the tightened limits (`marginApplied` true, the
 * tightened values in `limits`, the written ones in `requestedLimits`).
 */
export interface RegionBounds {
  minDampingRatio: number | null;
  minDecayRate: number | null;
  minDampedFrequency: number | null;
  maxRiseTime: number | null;
  riseTimeCurve: RiseTimeCurvePoint[];
  maxNaturalFrequency: number | null;
  settlingConstant: number | null;
  dominanceRatio: number;
  settlingBandPct: number;
  marginPct: number;
  marginApplied: boolean;
  /** Which limit sets minDampingRatio: the overshoot limit or the damping floor. */
  dampingFrom: 'maxOvershootPct' | 'minDampingRatio' | null;
  limits: Limits;
  requestedLimits: Limits;
  /** False when no pole position meets every limit at once. */
  feasible: boolean;
}

const CURVE_STEP = 0.02;

// Bounds of the admissible region for a checked requirement set: the damping
// floor zeta_min = max(minDampingRatio, zeta(maxOvershootPct)), the decay rate
// c / Ts, the damped frequency pi / Tp, the rise-time curve
// omega_n >= f(zeta) / Tr (sampled on zeta = k * 0.02) and the ceiling.
export function regionBounds(req: Requirements): RegionBounds {
  const band = req.settlingBandPct ?? 2;
  const marginPct = req.marginPct ?? 0;
  const limits = tightenLimits({ ...req, marginPct });
  const requestedLimits = tightenLimits({ ...req, marginPct: 0 });

  const zetaOs = limits.maxOvershootPct !== undefined ? dampingFromOvershoot(limits.maxOvershootPct) : null;
  const zetaFloor = limits.minDampingRatio ?? null;
  let minDampingRatio: number | null = null;
  let dampingFrom: RegionBounds['dampingFrom'] = null;
  if (zetaOs !== null && (zetaFloor === null || zetaOs >= zetaFloor)) {
    minDampingRatio = zetaOs;
    dampingFrom = 'maxOvershootPct';
  } else if (zetaFloor !== null) {
    minDampingRatio = zetaFloor;
    dampingFrom = 'minDampingRatio';
  }

  const c = limits.maxSettlingTime !== undefined ? settlingConstant(band) : null;
  const minDecayRate = c !== null && limits.maxSettlingTime !== undefined ? c / limits.maxSettlingTime : null;
  const minDampedFrequency = limits.maxPeakTime !== undefined ? Math.PI / limits.maxPeakTime : null;
  const maxRiseTime = limits.maxRiseTime ?? null;
  const maxNaturalFrequency = limits.maxNaturalFrequency ?? null;

  const riseTimeCurve: RiseTimeCurvePoint[] = [];
  if (maxRiseTime !== null) {
    const z0 = Math.min(minDampingRatio ?? 0, 1);
    const zetas = [z0];
    for (let k = Math.floor(z0 / CURVE_STEP); k * CURVE_STEP <= 1 + 1e-12; k++) {
      if (k * CURVE_STEP > z0 + 1e-9) zetas.push(k * CURVE_STEP);
    }
    for (const z of zetas) riseTimeCurve.push({ dampingRatio: z, minNaturalFrequency: riseTimeNormalizedFast(z) / maxRiseTime });
  }

  const radial = { minDecayRate, minDampedFrequency, maxRiseTime, maxNaturalFrequency };
  const feasible =
    (minDampingRatio === null || minDampingRatio <= 1) &&
    regionSweep(radial, minDampingRatio === null ? Math.PI / 2 : Math.acos(minDampingRatio), null).length > 0;

  return {
    minDampingRatio,
    minDecayRate,
    minDampedFrequency,
    maxRiseTime,
    riseTimeCurve,
    maxNaturalFrequency,
    settlingConstant: c,
    dominanceRatio: req.dominanceRatio ?? 5,
    settlingBandPct: band,
    marginPct,
    marginApplied: marginPct > 0,
    dampingFrom,
    limits,
    requestedLimits,
    feasible,
  };
}
