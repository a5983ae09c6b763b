import type { Requirements } from './types.js';

/** The six limits of a requirement set; the other fields are settings. */
export interface Limits {
  maxOvershootPct?: number;
  maxSettlingTime?: number;
  maxPeakTime?: number;
  maxRiseTime?: number;
  minDampingRatio?: number;
  maxNaturalFrequency?: number;
}

// The guard band: every upper limit shrinks by marginPct percent and the
// damping floor grows by it, so a value that meets the tightened limit keeps
// that much room to the written one. marginPct 0 returns the limits as given.
export function tightenLimits(req: Requirements): Limits {
  const f = (req.marginPct ?? 0) / 100;
  const out: Limits = {};
  if (req.maxOvershootPct !== undefined) out.maxOvershootPct = req.maxOvershootPct * (1 - f);
  if (req.maxSettlingTime !== undefined) out.maxSettlingTime = req.maxSettlingTime * (1 - f);
  if (req.maxPeakTime !== undefined) out.maxPeakTime = req.maxPeakTime * (1 - f);
  if (req.maxRiseTime !== undefined) out.maxRiseTime = req.maxRiseTime * (1 - f);
  if (req.minDampingRatio !== undefined) out.minDampingRatio = req.minDampingRatio * (1 + f);
  if (req.maxNaturalFrequency !== undefined) out.maxNaturalFrequency = req.maxNaturalFrequency * (1 - f);
  return out;
}
