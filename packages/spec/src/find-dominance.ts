// The dominant pole or pair and how far the rest of the model stands from it.
// dominant: the slowest pole or conjugate pair (largest real part) among the
// poles not nearly cancelled by a zero; for an unstable or marginal model the
// rightmost, with a note. For a pair, dampingRatio = -Re p / |p| and
// naturalFrequency = |p|; a real dominant pole has no damping ratio (null,
// first order) and naturalFrequency = |p| (its corner frequency).
// ratio = min |Re p| / |Re p_dom| over the other poles, zeroRatio likewise
// over the zeros, both null when there is nothing to compare.
// Near cancellation: |z - p| <= 1e-2 |p| (each zero cancels at most one pole,
// closest pairs first); such pairs are left out of both ratios, with a note.
import type { Complex, Dominance, Model } from './types.js';
import { axisTolerance } from './axis-tolerance.js';
import { formatNumber, formatRoot } from './format-complex.js';
import { newRootList } from './root-list.js';
import { magnitude } from './magnitude.js';

export const CANCELLATION_TOLERANCE = 1e-2;

export function findDominance(model: Model, dominanceRatio: number): Dominance {
  const notes: string[] = [];
  const poles = model.poles;
  if (poles.length === 0) {
    return {
      poles: newRootList(),
      dampingRatio: null,
      naturalFrequency: null,
      ratio: null,
      zeroRatio: null,
      approximationValid: false,
      notes: ['the model has no poles, so there is no dominant pole'],
    };
  }
  const { poleCancelled, zeroCancelled } = matchCancellations(model);
  for (let j = 0; j < model.zeros.length; j++) {
    const i = zeroCancelled[j] as number;
    const z = model.zeros[j] as Complex;
    if (i < 0 || z.im < 0) continue;
    notes.push(
      `the zero at ${formatRoot(z)} nearly cancels the ${z.im === 0 ? 'pole' : 'poles'} at ${formatRoot(poles[i] as Complex)} (within 1 %): the pair is left out of the dominance ratios`,
    );
  }
  // Plain loops, no callbacks: this runs once per design of a batch, in each
  // thread, and the callbacks inlined into it made it the costliest function
  // to compile (47 ms against 33 ms now, on a slow machine).
  const candidates: number[] = [];
  for (let i = 0; i < poles.length; i++) if (poleCancelled[i] === 0) candidates.push(i);
  if (candidates.length === 0) for (let i = 0; i < poles.length; i++) candidates.push(i);
  // poles are sorted slowest first, so the first candidate is the dominant one
  const d0 = candidates[0] as number;
  const dom = poles[d0] as Complex;
  let partner = -1;
  if (dom.im !== 0) {
    for (const i of candidates) {
      const p = poles[i] as Complex;
      if (i !== d0 && p.re === dom.re && p.im === -dom.im) {
        partner = i;
        break;
      }
    }
  }
  const isPair = dom.im !== 0;
  const what = isPair ? 'the dominant pair' : 'the dominant pole';
  const mod = magnitude(dom.re, dom.im);
  const tol = axisTolerance(poles);
  const stable = dom.re < -tol;
  if (!stable) {
    notes.push(
      `the model is not stable: the rightmost ${isPair ? 'poles' : 'pole'} at ${formatRoot(dom)} ${isPair ? 'are' : 'is'} taken as dominant, and the second-order view does not describe a response that does not settle`,
    );
  }
  const sigmaDom = Math.abs(dom.re);
  let ratio: number | null = null;
  let limiting: Complex | null = null;
  for (const i of candidates) {
    if (i === d0 || i === partner) continue;
    const p = poles[i] as Complex;
    if (sigmaDom === 0) break;
    const r = Math.abs(p.re) / sigmaDom;
    if (ratio === null || r < ratio) {
      ratio = r;
      limiting = p;
    }
  }
  let valid = stable;
  if (ratio !== null && limiting && ratio < dominanceRatio) {
    valid = false;
    const kind = limiting.im === 0 ? 'the real pole' : 'the poles';
    const verb = limiting.im === 0 ? 'is' : 'are';
    notes.push(
      `${kind} at ${formatRoot(limiting)} ${verb} only ${formatRatio(ratio)}x farther left than ${what} (${formatNumber(dominanceRatio)}x needed)`,
    );
  }
  let zeroRatio: number | null = null;
  let limitingZero: Complex | null = null;
  for (let j = 0; j < model.zeros.length; j++) {
    if ((zeroCancelled[j] as number) >= 0) continue;
    const z = model.zeros[j] as Complex;
    if (z.re > 0 && z.im >= 0) {
      valid = false;
      notes.push(`the zero${z.im === 0 ? '' : 's'} at ${formatRoot(z)} ${z.im === 0 ? 'is' : 'are'} in the right half-plane: expect undershoot`);
    }
    if (sigmaDom === 0) continue;
    const r = Math.abs(z.re) / sigmaDom;
    if (zeroRatio === null || r < zeroRatio) {
      zeroRatio = r;
      limitingZero = z;
    }
  }
  if (zeroRatio !== null && limitingZero && zeroRatio < dominanceRatio) {
    valid = false;
    if (limitingZero.re <= 0) {
      const kind = limitingZero.im === 0 ? 'the zero' : 'the zeros';
      const verb = limitingZero.im === 0 ? 'is' : 'are';
      notes.push(
        zeroRatio >= 1
          ? `${kind} at ${formatRoot(limitingZero)} ${verb} only ${formatRatio(zeroRatio)}x farther left than ${what} (${formatNumber(dominanceRatio)}x needed)`
          : `${kind} at ${formatRoot(limitingZero)} ${verb} closer to the imaginary axis than ${what} (${formatRatio(zeroRatio)}x, ${formatNumber(dominanceRatio)}x needed)`,
      );
    }
  }
  const dominant = newRootList();
  dominant.push({ re: dom.re, im: dom.im });
  if (partner >= 0) {
    const p = poles[partner] as Complex;
    dominant.push({ re: p.re, im: p.im });
  }
  return {
    poles: dominant,
    dampingRatio: isPair ? -dom.re / mod : null,
    naturalFrequency: mod,
    ratio,
    zeroRatio,
    approximationValid: valid,
    notes,
  };
}

function formatRatio(r: number): string {
  return r < 100 ? r.toFixed(r < 1 ? 2 : 1) : formatNumber(r);
}

function byDistance(a: { d: number }, b: { d: number }): number {
  return a.d - b.d;
}

// Closest (relative) pole-zero pairs first, each pole and zero used once.
// Typed arrays, whose shape does not depend on how V8 built them (an array
// from Array.prototype.map differs between the interpreter and optimised code).
function matchCancellations(model: Model): { poleCancelled: Uint8Array; zeroCancelled: Int32Array } {
  const candidates: { i: number; j: number; d: number }[] = [];
  for (let j = 0; j < model.zeros.length; j++) {
    const z = model.zeros[j] as Complex;
    for (let i = 0; i < model.poles.length; i++) {
      const p = model.poles[i] as Complex;
      const size = magnitude(p.re, p.im);
      const d = magnitude(z.re - p.re, z.im - p.im);
      if (d <= CANCELLATION_TOLERANCE * size || d === 0) candidates.push({ i, j, d: size === 0 ? 0 : d / size });
    }
  }
  if (candidates.length > 1) candidates.sort(byDistance);
  const poleCancelled = new Uint8Array(model.poles.length);
  const zeroCancelled = new Int32Array(model.zeros.length).fill(-1);
  for (const c of candidates) {
    if (poleCancelled[c.i] || (zeroCancelled[c.j] as number) >= 0) continue;
    poleCancelled[c.i] = 1;
    zeroCancelled[c.j] = c.i;
  }
  return { poleCancelled, zeroCancelled };
}
