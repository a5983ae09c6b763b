import type { Viewport } from '@polecourt/contracts';
import type { RegionBounds } from '@polecourt/spec';

/**
 * A default s-plane window that shows the whole admissible region's corner:
 * a scale from the largest bound (the natural-frequency ceiling if there is
 * one, else a few times the decay rate, damped frequency or rise-time
 * frequency), with a little room right of the imaginary axis.
 */
export function defaultViewport(bounds: RegionBounds): Viewport {
  const riseOmega = bounds.riseTimeCurve.reduce((m, p) => Math.max(m, p.minNaturalFrequency), 0);
  const scales = [bounds.minDecayRate, bounds.minDampedFrequency, riseOmega > 0 ? riseOmega : null].filter((v): v is number => v !== null && Number.isFinite(v) && v > 0);
  let scale = bounds.maxNaturalFrequency !== null ? bounds.maxNaturalFrequency * 1.25 : scales.length ? Math.max(...scales) * 2.5 : 10;
  if (!Number.isFinite(scale) || scale <= 0) scale = 10;
  const r = niceCeil(scale);
  return { reMin: -r, reMax: r * 0.2, imMin: -r, imMax: r };
}

// Rounds up to 1, 2 or 5 times a power of ten so axis ends are round numbers.
function niceCeil(x: number): number {
  const p = 10 ** Math.floor(Math.log10(x));
  for (const m of [1, 2, 5, 10]) if (m * p >= x) return m * p;
  return 10 * p;
}

/** The caller's window where given, the default elsewhere; an empty window is refused by the caller. */
export function mergeViewport(base: Viewport, given: Partial<Viewport>): Viewport {
  return {
    reMin: given.reMin ?? base.reMin,
    reMax: given.reMax ?? base.reMax,
    imMin: given.imMin ?? base.imMin,
    imMax: given.imMax ?? base.imMax,
  };
}
