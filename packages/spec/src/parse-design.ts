// The edge check of a design: accepts zero-pole-gain {poles, zeros?, gain, id?}
// or polynomial {numerator, denominator, id?} (highest power first), rejects
// anything else with a SpecInputError naming the field, and returns a Model
// with both forms filled in (zpk -> polynomial by expanding real factors,
// polynomial -> zpk by Aberth root finding).
//
// Choices: leading zeros of the numerator are stripped (padding to the
// denominator's length is common); a zero leading denominator coefficient is
// refused, since it silently changes the order of the model. Complex poles and
// zeros are matched with their conjugates within a relative 1e-9 and then made
// exact conjugates (the average of the two). Unknown fields are refused: a
// misspelt "zero" must not silently drop the zeros.
import type { Complex, Model } from './types.js';
import { SpecInputError } from './spec-input-error.js';
import { MAX_MODEL_ORDER } from './max-model-order.js';
import { polyFromRoots } from './poly-from-roots.js';
import { polyRoots } from './poly-roots.js';
import { refineClusterFactors } from './refine-cluster-factors.js';
import { rootConsistency } from './root-consistency.js';
import { formatNumber } from './format-complex.js';
import { newRootList } from './root-list.js';
import { sortRoots } from './sort-roots.js';
import { magnitude } from './magnitude.js';

/** Root sets that reproduce a polynomial worse than this (relative) are refused (see parsePolynomial). */
const ROOTS_REFUSED = 1e-4;

const CONJUGATE_TOLERANCE = 1e-9;
const ZPK_FIELDS = new Set(['id', 'poles', 'zeros', 'gain']);
const POLYNOMIAL_FIELDS = new Set(['id', 'numerator', 'denominator']);

export function parseDesign(input: unknown): Model {
  if (!isPlainObject(input)) {
    throw new SpecInputError(
      'design_not_object',
      'A design must be an object with either poles, zeros and gain, or numerator and denominator.',
    );
  }
  const has = (k: string) => Object.prototype.hasOwnProperty.call(input, k) && input[k] !== undefined;
  const zpk = has('poles') || has('zeros') || has('gain');
  const polynomial = has('numerator') || has('denominator');
  if (zpk && polynomial) {
    throw new SpecInputError(
      'design_form_ambiguous',
      'A design gives either poles, zeros and gain, or numerator and denominator, not both.',
    );
  }
  if (!zpk && !polynomial) {
    throw new SpecInputError(
      'design_form_missing',
      'A design needs either poles and gain, or numerator and denominator.',
    );
  }
  const allowed = zpk ? ZPK_FIELDS : POLYNOMIAL_FIELDS;
  for (const key of Object.keys(input)) {
    if (!allowed.has(key)) {
      throw new SpecInputError('unknown_field', `"${key}" is not a field of a ${zpk ? 'zero-pole-gain' : 'polynomial'} design.`, key);
    }
  }
  const id = parseId(input['id']);
  const model = zpk ? parseZpk(input) : parsePolynomial(input);
  return id === undefined ? model : { id, ...model };
}

function parseId(value: unknown): string | undefined {
  if (value === undefined) return undefined;
  if (typeof value !== 'string') throw new SpecInputError('invalid_type', 'id must be a string.', 'id');
  if (value.length > 200) throw new SpecInputError('invalid_value', 'id must be at most 200 characters long.', 'id');
  return value;
}

function parseZpk(input: Record<string, unknown>): Model {
  if (!Object.prototype.hasOwnProperty.call(input, 'poles')) {
    throw new SpecInputError('missing_field', 'A zero-pole-gain design needs a poles list (it may be empty).', 'poles');
  }
  const poles = parseRootList(input['poles'], 'poles');
  const zeros = input['zeros'] === undefined ? [] : parseRootList(input['zeros'], 'zeros');
  if (zeros.length > poles.length) {
    throw new SpecInputError(
      'improper_model',
      `The model has ${zeros.length} zeros but only ${poles.length} poles; it must be proper (no more zeros than poles).`,
      'zeros',
    );
  }
  if (!Object.prototype.hasOwnProperty.call(input, 'gain')) {
    throw new SpecInputError('missing_field', 'A zero-pole-gain design needs a gain.', 'gain');
  }
  const gain = parseFiniteNumber(input['gain'], 'gain');
  if (gain === 0) throw new SpecInputError('zero_gain', 'The gain must not be zero: the model would have no response.', 'gain');
  const sortedPoles = sortRoots(enforceConjugates(poles, 'poles'));
  const sortedZeros = sortRoots(enforceConjugates(zeros, 'zeros'));
  const denominator = polyFromRoots(sortedPoles);
  const numerator = polyFromRoots(sortedZeros, gain);
  if (!denominator.every(Number.isFinite) || !numerator.every(Number.isFinite)) {
    throw new SpecInputError(
      'coefficient_overflow',
      'The polynomial coefficients of this model overflow double precision; express it in other time units (e.g. ms instead of s).',
      denominator.every(Number.isFinite) ? 'zeros' : 'poles',
    );
  }
  return { form: 'zpk', poles: sortedPoles, zeros: sortedZeros, gain, numerator, denominator };
}

function parsePolynomial(input: Record<string, unknown>): Model {
  const rawNum = parseCoefficientList(input['numerator'], 'numerator');
  const rawDen = parseCoefficientList(input['denominator'], 'denominator');
  if (rawDen.length === 0) {
    throw new SpecInputError('empty_denominator', 'The denominator needs at least one coefficient.', 'denominator');
  }
  if (rawDen[0] === 0) {
    throw new SpecInputError(
      'leading_zero',
      'The leading denominator coefficient (highest power) must not be zero; drop it if the order is lower.',
      'denominator[0]',
    );
  }
  let first = 0;
  while (first < rawNum.length && rawNum[first] === 0) first++;
  if (first === rawNum.length) {
    throw new SpecInputError('zero_gain', 'The numerator is zero: the model would have no response.', 'numerator');
  }
  const num = rawNum.slice(first);
  if (num.length > rawDen.length) {
    throw new SpecInputError(
      'improper_model',
      `The numerator has degree ${num.length - 1} but the denominator only ${rawDen.length - 1}; the model must be proper.`,
      'numerator',
    );
  }
  const lead = rawDen[0] as number;
  const denominator = rawDen.map((v) => v / lead);
  const numerator = num.map((v) => v / lead);
  if (!denominator.every(Number.isFinite) || !numerator.every(Number.isFinite)) {
    throw new SpecInputError(
      'coefficient_overflow',
      'Dividing by the leading denominator coefficient overflows double precision; rescale the coefficients.',
      'denominator[0]',
    );
  }
  const model: Model = { form: 'polynomial', poles: polyRoots(denominator), zeros: polyRoots(numerator), gain: numerator[0] as number, numerator, denominator };
  // Clustering a tight group of roots can leave a set that no longer
  // reproduces the polynomial (root-consistency.ts); the clusters' refined
  // factors, or the roots as found, each polished on its own, may do better.
  const found = rootConsistency(model);
  if (found.ok) return model;
  // A near-multiple root taken for an exact one: refine the clusters' factors.
  const factored: Model = {
    ...model,
    poles: sortRoots(refineClusterFactors(denominator, model.poles)),
    zeros: sortRoots(refineClusterFactors(numerator, model.zeros)),
  };
  if (rootConsistency(factored).ok) return factored;
  const separate: Model = { ...model, poles: polyRoots(denominator, true), zeros: polyRoots(numerator, true) };
  const apart = rootConsistency(separate);
  if (apart.ok) return separate;
  const best = apart.worst < found.worst ? apart : found;
  // Roots this far off would misplace poles, dominance and plots, not only
  // the metrics (computeStepMetrics refuses those on any mismatch): refuse
  // the design, naming the polynomial.
  if (best.worst > ROOTS_REFUSED) {
    const which = best.field === 'denominator' ? 'poles' : 'zeros';
    throw new SpecInputError(
      'roots_ill_determined',
      `The ${which} of these coefficients cannot be found accurately in double precision: the ${which} found miss the ${best.field} by ${formatNumber(best.worst, 2)} of its value (at w = ${formatNumber(best.at)} rad/s). This happens with a root of high multiplicity or a tight cluster of roots; enter the model in zero-pole-gain form.`,
      best.field,
    );
  }
  return best === apart ? separate : model;
}

function parseRootList(value: unknown, path: string): Complex[] {
  if (!Array.isArray(value)) throw new SpecInputError('invalid_type', `${path} must be a list of {re, im} numbers.`, path);
  if (value.length > MAX_MODEL_ORDER) {
    throw new SpecInputError(
      'order_too_high',
      `A design may have at most ${MAX_MODEL_ORDER} ${path}; this one has ${value.length}.`,
      path,
    );
  }
  const out = newRootList();
  for (let i = 0; i < value.length; i++) {
    const item: unknown = value[i];
    const at = `${path}[${i}]`;
    if (!isPlainObject(item)) throw new SpecInputError('invalid_type', `${at} must be an object {re, im}.`, at);
    for (const key of Object.keys(item)) {
      if (key !== 're' && key !== 'im') throw new SpecInputError('unknown_field', `"${key}" is not a field of ${at}; use re and im.`, `${at}.${key}`);
    }
    out.push({ re: parseFiniteNumber(item['re'], `${at}.re`), im: parseFiniteNumber(item['im'], `${at}.im`) });
  }
  return out;
}

function parseCoefficientList(value: unknown, path: string): number[] {
  if (value === undefined) throw new SpecInputError('missing_field', `A polynomial design needs a ${path}.`, path);
  if (!Array.isArray(value)) throw new SpecInputError('invalid_type', `${path} must be a list of numbers, highest power first.`, path);
  if (value.length > MAX_MODEL_ORDER + 1) {
    throw new SpecInputError(
      'order_too_high',
      `A design may have order at most ${MAX_MODEL_ORDER} (${MAX_MODEL_ORDER + 1} coefficients); ${path} has ${value.length} coefficients.`,
      path,
    );
  }
  return value.map((v, i) => parseFiniteNumber(v, `${path}[${i}]`));
}

function parseFiniteNumber(value: unknown, path: string): number {
  if (typeof value !== 'number') {
    throw new SpecInputError(value === undefined ? 'missing_field' : 'invalid_type', `${path} must be a number.`, path);
  }
  if (!Number.isFinite(value)) throw new SpecInputError('not_finite', `${path} must be a finite number, not ${value}.`, path);
  return value;
}

// Pairs every non-real entry with its conjugate (relative tolerance 1e-9) and
// replaces both by exact conjugates; an entry left without a partner is an error.
function enforceConjugates(list: Complex[], path: string): Complex[] {
  const out = newRootList();
  for (const z of list) out.push({ re: z.re, im: z.im });
  const matched = new Uint8Array(out.length);
  for (let i = 0; i < out.length; i++) {
    const a = out[i] as Complex;
    if (a.im === 0 || matched[i]) continue;
    let best = -1;
    let bestD = Infinity;
    for (let j = i + 1; j < out.length; j++) {
      const b = out[j] as Complex;
      if (matched[j] || b.im === 0) continue;
      const d = magnitude(a.re - b.re, a.im + b.im);
      if (d < bestD) {
        bestD = d;
        best = j;
      }
    }
    const b = best >= 0 ? (out[best] as Complex) : undefined;
    if (!b || bestD > CONJUGATE_TOLERANCE * Math.max(magnitude(a.re, a.im), magnitude(b.re, b.im))) {
      const sign = a.im > 0 ? '-' : '+';
      throw new SpecInputError(
        'unmatched_conjugate',
        `${path}[${i}] = ${a.re} ${a.im > 0 ? '+' : '-'} ${Math.abs(a.im)}j has no conjugate ${a.re} ${sign} ${Math.abs(a.im)}j in ${path}; complex ${path} come in conjugate pairs.`,
        `${path}[${i}]`,
      );
    }
    matched[i] = matched[best] = 1;
    const re = (a.re + b.re) / 2;
    const im = (Math.abs(a.im) + Math.abs(b.im)) / 2;
    a.re = b.re = re;
    a.im = a.im > 0 ? im : -im;
    b.im = -a.im;
  }
  return out;
}

function isPlainObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}
