// Whether the poles and zeros found for a polynomial-form model stand for
// it: G(jw) from the computed roots against G(jw) from the coefficients, at
// w = 0 and at each distinct pole and zero magnitude (where the response's
// time scales are). The step response follows from G, so roots that
// reproduce G there to 1e-8, or to within the coefficients' own rounding
// level where that is coarser, give its response; roots that do not (the
// ring of a root of high multiplicity, each point as good as double
// precision allows on its own but not together) would give another model's.
import type { Model } from './types.js';

const EPS = 2.220446049250313e-16;
const TOLERANCE = 1e-8;
/** Allowance over the coefficients' rounding level (Horner's error bound). */
const ROUNDING_FACTOR = 100;

export interface RootConsistency {
  /** Largest |G_roots - G_coefficients| / |G_coefficients| found. */
  worst: number;
  /** The frequency of the worst one (rad/s). */
  at: number;
  ok: boolean;
}

export function rootConsistency(model: Model): RootConsistency {
  const freqs = new Set<number>([0]);
  for (const r of model.poles) freqs.add(Math.hypot(r.re, r.im));
  for (const r of model.zeros) freqs.add(Math.hypot(r.re, r.im));
  let worst = 0;
  let at = 0;
  let ok = true;
  for (const w of freqs) {
    const num = horner(model.numerator, w);
    const den = horner(model.denominator, w);
    // G from the coefficients, and its rounding level relative to |G|
    const dm = den.re * den.re + den.im * den.im;
    if (dm === 0) continue;
    const gr = (num.re * den.re + num.im * den.im) / dm;
    const gi = (num.im * den.re - num.re * den.im) / dm;
    const gm = Math.hypot(gr, gi);
    if (gm === 0) continue;
    const level = ROUNDING_FACTOR * EPS * (num.bound / Math.hypot(num.re, num.im) + den.bound / Math.sqrt(dm));
    // G from the roots: gain * prod (jw - z) / prod (jw - p)
    let rr = model.gain;
    let ri = 0;
    const n = Math.max(model.poles.length, model.zeros.length);
    for (let i = 0; i < n; i++) {
      const z = model.zeros[i];
      if (z) {
        const ar = -z.re;
        const ai = w - z.im;
        const t = rr * ar - ri * ai;
        ri = rr * ai + ri * ar;
        rr = t;
      }
      const p = model.poles[i];
      if (p) {
        const br = -p.re;
        const bi = w - p.im;
        const d = br * br + bi * bi;
        const t = (rr * br + ri * bi) / d;
        ri = (ri * br - rr * bi) / d;
        rr = t;
      }
    }
    const rel = Math.hypot(rr - gr, ri - gi) / gm;
    if (!(rel <= Math.max(TOLERANCE, level))) ok = false;
    if (!(rel <= worst)) {
      worst = rel;
      at = w;
    }
  }
  return { worst, at, ok };
}

// p(jw) by Horner, with sum |a_i| w^i (its rounding level over eps).
function horner(c: readonly number[], w: number): { re: number; im: number; bound: number } {
  let re = 0;
  let im = 0;
  let bound = 0;
  for (const a of c) {
    // (re + j im) * (j w) + a
    const t = -im * w + a;
    im = re * w;
    re = t;
    bound = bound * w + Math.abs(a);
  }
  return { re, im, bound };
}
