// The modal form to evaluate a stable model's step response from: the
// default clustering (partial-fractions.ts) unless its terms cancel so much
// that round-off would show (poles 1e-5 to 1e-2 of their size apart, next to
// each other), then the first wider clustering, summed exactly by expansion,
// whose terms do not. Without one, the default form: its caller judges it,
// by the spread returned with it.
import { magnitude } from './magnitude.js';
import { clusteredPartialFractions, partialFractions, type ModalForm } from './partial-fractions.js';
import type { Model } from './types.js';

/** Largest acceptable round-off of the modal sum, relative to y_f. */
export const MAX_ROUNDING = 1e-8;
/** Wider cluster tolerances tried in turn, relative to the poles' size. */
const RETRY_TOLERANCES = [1e-4, 1e-3, 1e-2, 3e-2, 1e-1];

/** sum |C_kn| of the transient terms over |y_f|: eps times it is the sum's round-off. */
export function modalSpread(form: ModalForm, yf: number): number {
  let s = 0;
  for (const t of form.terms) {
    if (t.sigma === 0 && t.omega === 0) continue;
    for (let n = 0; n < t.multiplicity; n++) s += magnitude(t.cos[n] as number, t.sin[n] as number);
  }
  return s / Math.abs(yf);
}

/**
 * yf: the model's DC gain (dc-gain.ts), null with a pole at the origin.
 * spread: modalSpread of the form returned (NaN without a final value).
 */
export function conditionedModalForm(model: Model, yf: number | null): { form: ModalForm; spread: number } {
  const form = partialFractions(model);
  if (yf === null || yf === 0) return { form, spread: Number.NaN };
  const spread = modalSpread(form, yf);
  if (!(spread * Number.EPSILON > MAX_ROUNDING)) return { form, spread };
  for (const tolerance of RETRY_TOLERANCES) {
    const wider = clusteredPartialFractions(model, tolerance);
    if (wider === null) continue;
    const widerSpread = modalSpread(wider, yf);
    if (widerSpread * Number.EPSILON <= MAX_ROUNDING) return { form: wider, spread: widerSpread };
  }
  return { form, spread };
}
