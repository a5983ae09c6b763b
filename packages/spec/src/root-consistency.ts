// Whether the poles and zeros found for a polynomial-form model stand for
// it: the numerator and denominator evaluated from the computed roots
// against the same from the coefficients, at w = 0 and at each distinct
// root magnitude on the imaginary axis (where the response's time scales
// are). The step response follows from G = N / D, so roots that reproduce N
// and D there to 1e-8 (or to the coefficients' own rounding level, where
// that is coarser) give its response; roots that do not (the ring of a root
// of high multiplicity, each point as good as double precision allows on
// its own but not together) would give another model's.
import type { Model } from './types.js';

const TOLERANCE = 1e-8;
/** Allowance over the coefficients' rounding level (Horner's error bound). */
const ROUNDING_FACTOR = 100;

export interface RootConsistency {
  /** Largest relative error of N or D from the roots, against the coefficients. */
  worst: number;
  /** The frequency of the worst one (rad/s). */
  at: number;
  /** Which polynomial's roots it is. */
  field: 'numerator' | 'denominator';
  ok: boolean;
}

export function rootConsistency(model: Model): RootConsistency {
  const freqs = new Set<number>([0]);
  for (const r of model.poles) freqs.add(Math.hypot(r.re, r.im));
  for (const r of model.zeros) freqs.add(Math.hypot(r.re, r.im));
  const out: RootConsistency = { worst: 0, at: 0, field: 'denominator', ok: true };
  for (const w of freqs) {
    compare(model.denominator, model.poles, 1, w, 'denominator', out);
    compare(model.numerator, model.zeros, model.gain, w, 'numerator', out);
  }
  return out;
}

function compare(coeffs: readonly number[], roots: Model['poles'], lead: number, w: number, field: RootConsistency['field'], out: RootConsistency): void {
  // from the coefficients, by Horner, with sum |a_i| w^i (its rounding level over eps)
  let cr = 0;
  let ci = 0;
  let bound = 0;
  for (const a of coeffs) {
    const t = -ci * w + a; // (cr + j ci) (j w) + a
    ci = cr * w;
    cr = t;
    bound = bound * w + Math.abs(a);
  }
  const cm = Math.hypot(cr, ci);
  if (cm === 0) return;
  // from the roots: lead * prod (jw - r)
  let rr = lead;
  let ri = 0;
  for (const r of roots) {
    const ar = -r.re;
    const ai = w - r.im;
    const t = rr * ar - ri * ai;
    ri = rr * ai + ri * ar;
    rr = t;
  }
  const rel = Math.hypot(rr - cr, ri - ci) / cm;
  if (!(rel <= Math.max(TOLERANCE, (ROUNDING_FACTOR * Number.EPSILON * bound) / cm))) out.ok = false;
  if (!(rel <= out.worst)) {
    out.worst = rel;
    out.at = w;
    out.field = field;
  }
}
