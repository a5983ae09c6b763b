import type { Complex, Viewport } from './types.js';

export interface SplaneViewportInput {
  poles: readonly Complex[];
  zeros?: readonly Complex[];
  dominantPoles?: readonly Complex[];
  dominanceRatio?: number | null;
  /** Features of the admissible region worth keeping in view (any may be null). */
  region?: {
    minDecayRate?: number | null;
    minDampedFrequency?: number | null;
    maxNaturalFrequency?: number | null;
  } | null;
  /** The pixel box the plot will fill: the viewport is widened to its aspect so both axes share one scale. */
  width: number;
  height: number;
  /** Poles and zeros farther left than this many times the interesting span are left off (shown as edge marks). */
  farFactor?: number;
}

/**
 * Picks the s-plane rectangle for a plot: the origin, every pole and zero
 * near the action, the dominance threshold and the region's lines, with a
 * little room around them; the imaginary range symmetric about the real
 * axis; then widened so one unit is the same number of pixels on both axes
 * (so damping rays show their true angle). Far poles (more than `farFactor`
 * times the span of the rest) are left outside and drawn as edge marks.
 */
export function splaneViewport(input: SplaneViewportInput): Viewport {
  const zeros = input.zeros ?? [];
  const dominant = input.dominantPoles ?? [];
  const farFactor = input.farFactor ?? 3;
  const focusRe: number[] = [0];
  const focusIm: number[] = [0];
  for (const p of dominant) {
    focusRe.push(p.re);
    focusIm.push(Math.abs(p.im));
  }
  const domRe = dominant.length > 0 ? Math.min(...dominant.map((p) => p.re)) : null;
  if (domRe !== null && domRe < 0 && input.dominanceRatio && input.dominanceRatio > 0) focusRe.push(domRe * input.dominanceRatio);
  const r = input.region;
  if (r?.minDecayRate) focusRe.push(-r.minDecayRate);
  if (r?.minDampedFrequency) focusIm.push(r.minDampedFrequency);
  if (r?.maxNaturalFrequency) {
    focusRe.push(-r.maxNaturalFrequency);
    focusIm.push(r.maxNaturalFrequency);
  }
  const all = [...input.poles, ...zeros];
  // Without a dominant pair, every root is "the action".
  if (dominant.length === 0) for (const p of all) focusRe.push(p.re);
  const span0 = Math.max(...focusRe.map(Math.abs), ...focusIm, 1e-9);
  const reach = span0 * farFactor;
  const shown = all.filter((p) => Math.abs(p.re) <= reach && Math.abs(p.im) <= reach);
  const re = [...focusRe, ...shown.map((p) => p.re)];
  const im = [...focusIm, ...shown.map((p) => Math.abs(p.im))];

  let reMin = Math.min(...re);
  let reMax = Math.max(...re);
  let imMax = Math.max(...im);
  const span = Math.max(reMax - reMin, 2 * imMax, 1e-9);
  const pad = 0.12 * span;
  reMin -= pad;
  reMax = Math.max(reMax, 0) + pad * 0.6;
  imMax = imMax + pad;

  // Equal scale: widen whichever range is short for the box's aspect.
  const aspect = input.width / input.height;
  const reSpan = reMax - reMin;
  const imSpan = 2 * imMax;
  if (reSpan / imSpan < aspect) {
    const extra = imSpan * aspect - reSpan;
    // Most of the extra room goes to the left half-plane, where the poles are.
    reMin -= extra * 0.85;
    reMax += extra * 0.15;
  } else {
    imMax = reSpan / aspect / 2;
  }
  return { reMin, reMax, imMin: -imMax, imMax };
}
