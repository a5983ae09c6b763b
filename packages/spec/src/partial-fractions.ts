// Modal (partial-fraction) form of the unit-step response Y(s) = G(s)/s.
// For each distinct pole q of Y with multiplicity m, y(t) holds
// sum_{n<m} c_n t^n e^{qt} with c_n = H^(m-1-n)(q) / ((m-1-n)! n!), where
// H(s) = Y(s) (s - q)^m. The Taylor coefficients of H at q come from
// multiplying truncated power series of its linear factors (h + q - z) and
// 1/(h + q - r), h = s - q: exact for repeated poles (no finite differences),
// and a zero next to a pole only makes that pole's residue small.
// Conjugate pairs are combined into real terms
// t^n e^{sigma t} (A_n cos(omega t) + B_n sin(omega t)), A_n = 2 Re c_n,
// B_n = -2 Im c_n, so y(t) is evaluated in real arithmetic.
//
// Clustering: poles closer than a tolerance (1e-5 of their size by default)
// are one cluster, centred on their mean c with offsets e_i. Kept apart, such
// poles have huge residues that cancel (round-off eps/delta); as one cluster
// their terms are summed exactly by expansion about c: on a circle
// |s - c| = r around the cluster, prod 1/(s - c - e_i) = sum_k h_k(e) /
// (s - c)^(m+k), with h_k the complete homogeneous symmetric polynomials of
// the offsets (h_1 = 0 about the mean), so the cluster's response is that of
// one pole at c of multiplicity m + K with numerator factor
// P(h) = sum_{k<=K} h_k h^(K-k), h = s - c. K is the least order whose
// neglected tail, bounded by Cauchy's estimate on that circle
// (r^(1-m) max|R| sum_{k>K} |h_k| r^-k, R the rest of Y, r at most half the
// way to the nearest other pole and at most |Re c|), is below 1e-14 of the
// final value; exact repeats need K = 0. A cluster too wide for that (its
// offsets over a quarter of r) is merged without the tail by default, as
// before, and refused by clusteredPartialFractions.
//
// Y is strictly proper, so there is no impulse at t = 0; the feedthrough
// D = G(inf) is reported because y(0+) = D.
import type { Complex, Model } from './types.js';
import { dcGain } from './dc-gain.js';
import { magnitude } from './magnitude.js';

export const POLE_CLUSTER_TOLERANCE = 1e-5;

export interface ModalTerm {
  /** The pole sigma + j omega; omega > 0 stands for the conjugate pair. */
  sigma: number;
  omega: number;
  multiplicity: number;
  /** A_n: coefficient of t^n e^{sigma t} cos(omega t) (for a real pole, of t^n e^{sigma t}). */
  cos: number[];
  /** B_n: coefficient of t^n e^{sigma t} sin(omega t) (zeros for a real pole). */
  sin: number[];
}

export interface ModalForm {
  terms: ModalTerm[];
  /** D = lim G(s) as s -> infinity = y(0+). */
  feedthrough: number;
}

interface Group {
  re: number;
  im: number;
  m: number;
  members: Complex[];
}

/** Truncation error allowed for a cluster's expansion, relative to the final value. */
const EXPANSION_ERROR = 1e-14;
/** The most expansion terms a cluster may take. */
const MAX_EXPANSION = 40;
/** Largest ratio of a cluster's offsets to its circle's radius. */
const MAX_SPREAD_RATIO = 0.25;

export function partialFractions(model: Model): ModalForm {
  return build(model, POLE_CLUSTER_TOLERANCE, false) as ModalForm;
}

/**
 * The modal form with poles closer than `tolerance` (relative) clustered, or
 * null when a cluster is too wide to sum exactly by expansion.
 */
export function clusteredPartialFractions(model: Model, tolerance: number): ModalForm | null {
  return build(model, tolerance, true);
}

function build(model: Model, tolerance: number, strict: boolean): ModalForm | null {
  const groups = clusterPoles([...model.poles, { re: 0, im: 0 }], tolerance);
  const terms: ModalTerm[] = [];
  const zeros = model.zeros;
  for (let g = 0; g < groups.length; g++) {
    const q = groups[g] as Group;
    if (q.im < 0) continue; // the conjugate of a pair that is handled once
    const others: Complex[] = [];
    for (let k = 0; k < groups.length; k++) {
      if (k === g) continue;
      const o = groups[k] as Group;
      for (let j = 0; j < o.m; j++) others.push(o.members[j] as Complex);
    }
    const h = q.m > 1 ? expansion(q, others, zeros, model) : null;
    if (h === null && q.m > 1 && strict) return null;
    // h = [h_0 .. h_K] (re, im interleaved); without one, the plain merge
    const extra = h === null ? 0 : h.length / 2 - 1;
    const m = q.m + extra;
    const sr = new Float64Array(m);
    const si = new Float64Array(m);
    sr[0] = model.gain;
    const steps = Math.max(zeros.length, others.length);
    for (let i = 0; i < steps; i++) {
      const z = zeros[i];
      if (z) multiplyLinear(sr, si, q.re - z.re, q.im - z.im);
      const r = others[i];
      if (r) divideLinear(sr, si, q.re - r.re, q.im - r.im);
    }
    if (h !== null && extra > 0) multiplyExpansion(sr, si, h, extra);
    const cos: number[] = [];
    const sin: number[] = [];
    // the series holds Taylor coefficients H^(k)(q)/k!, so c_n = S_{m-1-n} / n!
    let nFactorial = 1;
    for (let n = 0; n < m; n++) {
      if (n > 0) nFactorial *= n;
      const k = m - 1 - n;
      const cr = (sr[k] as number) / nFactorial;
      const ci = (si[k] as number) / nFactorial;
      if (q.im === 0) {
        cos.push(cr);
        sin.push(0);
      } else {
        cos.push(2 * cr);
        sin.push(-2 * ci);
      }
    }
    terms.push({ sigma: q.re, omega: q.im, multiplicity: m, cos, sin });
  }
  const feedthrough = model.zeros.length === model.poles.length ? model.gain : 0;
  return { terms, feedthrough };
}

function clusterPoles(poles: Complex[], tolerance: number): Group[] {
  const n = poles.length;
  const parent = new Int32Array(n);
  const size = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const a = poles[i] as Complex;
    parent[i] = i;
    size[i] = magnitude(a.re, a.im);
  }
  const find = (i: number): number => {
    while (parent[i] !== i) i = parent[i] as number;
    return i;
  };
  for (let i = 0; i < n; i++) {
    const a = poles[i] as Complex;
    for (let j = i + 1; j < n; j++) {
      const b = poles[j] as Complex;
      const d = magnitude(a.re - b.re, a.im - b.im);
      if (d <= tolerance * Math.max(size[i] as number, size[j] as number)) {
        parent[find(i)] = find(j);
      }
    }
  }
  // groups in the order their first pole appears
  const out: Group[] = [];
  const slot = new Int32Array(n).fill(-1);
  // whether a group has a member above the real axis, and one on or below it
  const above = new Uint8Array(n);
  const below = new Uint8Array(n);
  for (let i = 0; i < n; i++) {
    const a = poles[i] as Complex;
    const root = find(i);
    let g = slot[root] as number;
    if (g < 0) {
      g = slot[root] = out.length;
      out.push({ re: 0, im: 0, m: 0, members: [] });
    }
    const group = out[g] as Group;
    group.re += a.re;
    group.im += a.im;
    group.m++;
    group.members.push(a);
    if (a.im > 0) above[g] = 1;
    else below[g] = 1;
  }
  for (let g = 0; g < out.length; g++) {
    const group = out[g] as Group;
    group.re /= group.m;
    group.im /= group.m;
    // A cluster that swallowed a conjugate pair (members on both sides of,
    // or on, the real axis) sits on the real axis. A pair that was not
    // clustered keeps its imaginary part however small: snapping it would
    // leave two equal real poles, each counted once, and no residue.
    if (above[g] && below[g]) group.im = 0;
  }
  return out;
}

// series *= (h + a), truncated to its length
function multiplyLinear(sr: Float64Array, si: Float64Array, ar: number, ai: number): void {
  for (let k = sr.length - 1; k >= 0; k--) {
    const xr = sr[k] as number;
    const xi = si[k] as number;
    let nr = xr * ar - xi * ai;
    let ni = xr * ai + xi * ar;
    if (k > 0) {
      nr += sr[k - 1] as number;
      ni += si[k - 1] as number;
    }
    sr[k] = nr;
    si[k] = ni;
  }
}

// series /= (h + b): T_k = (S_k - T_{k-1}) / b
function divideLinear(sr: Float64Array, si: Float64Array, br: number, bi: number): void {
  const d = br * br + bi * bi;
  for (let k = 0; k < sr.length; k++) {
    let xr = sr[k] as number;
    let xi = si[k] as number;
    if (k > 0) {
      xr -= sr[k - 1] as number;
      xi -= si[k - 1] as number;
    }
    sr[k] = (xr * br + xi * bi) / d;
    si[k] = (xi * br - xr * bi) / d;
  }
}

// h_0 .. h_K of the cluster's offsets from its centre (re, im interleaved),
// K the least order meeting EXPANSION_ERROR (header), or null when none up
// to MAX_EXPANSION does or the cluster is too wide for its circle.
function expansion(q: Group, others: Complex[], zeros: Complex[], model: Model): Float64Array | null {
  const m = q.m;
  let rho = 0;
  for (const a of q.members) rho = Math.max(rho, magnitude(a.re - q.re, a.im - q.im));
  if (rho === 0) return new Float64Array([1, 0]);
  let nearest = Infinity;
  for (const o of others) nearest = Math.min(nearest, magnitude(o.re - q.re, o.im - q.im));
  const r = Math.min(0.5 * nearest, Math.abs(q.re));
  if (!(rho <= MAX_SPREAD_RATIO * r)) return null;
  // |R| on the circle: the gain, the zeros and the other poles, bounded factor by factor
  let rMax = Math.abs(model.gain);
  for (const z of zeros) rMax *= magnitude(q.re - z.re, q.im - z.im) + r;
  for (const o of others) rMax /= magnitude(q.re - o.re, q.im - o.im) - r;
  // relative to |y_f| = |G(0)| (none with a pole at the origin: no bound holds)
  const scale = (r ** (1 - m) * rMax) / Math.abs(dcGain(model) ?? 0);
  // h_k by multiplying the series 1 / (1 - e_i x) = sum e_i^j x^j
  const n = MAX_EXPANSION + 2;
  const hr = new Float64Array(n);
  const hi = new Float64Array(n);
  hr[0] = 1;
  for (const a of q.members) {
    const er = a.re - q.re;
    const ei = a.im - q.im;
    for (let k = 1; k < n; k++) {
      const pr = hr[k - 1] as number;
      const pi = hi[k - 1] as number;
      hr[k] = (hr[k] as number) + er * pr - ei * pi;
      hi[k] = (hi[k] as number) + er * pi + ei * pr;
    }
  }
  const ratio = rho / r;
  for (let K = 0; K <= MAX_EXPANSION; K++) {
    // |h_{K+1}| / r^{K+1} as computed, and the rest by |h_k| <= C(m+k-1, k) rho^k
    let tail = magnitude(hr[K + 1] as number, hi[K + 1] as number) / r ** (K + 1);
    let rest = 0;
    let term = binomial(m + K + 1, K + 2) * ratio ** (K + 2);
    // terms shrink geometrically once (m + k) / (k + 1) * ratio < 1/2
    for (let k = K + 2; k < K + 500 && term > 0; k++) {
      rest += term;
      const factor = ((m + k) / (k + 1)) * ratio;
      term *= factor;
      if (factor < 0.5 && term < 1e-3 * rest) {
        rest += 2 * term; // the geometric remainder
        break;
      }
    }
    tail += rest;
    if (scale * tail <= EXPANSION_ERROR) {
      const h = new Float64Array(2 * (K + 1));
      for (let k = 0; k <= K; k++) {
        h[2 * k] = hr[k] as number;
        h[2 * k + 1] = hi[k] as number;
      }
      return h;
    }
  }
  return null;
}

function binomial(n: number, k: number): number {
  let b = 1;
  for (let i = 1; i <= k; i++) b = (b * (n - k + i)) / i;
  return b;
}

// series *= P(h) = sum_{k<=K} h_k h^(K-k), truncated to its length
function multiplyExpansion(sr: Float64Array, si: Float64Array, h: Float64Array, K: number): void {
  for (let j = sr.length - 1; j >= 0; j--) {
    let nr = 0;
    let ni = 0;
    for (let i = 0; i <= Math.min(j, K); i++) {
      // coefficient of h^i in P is h_{K-i}
      const pr = h[2 * (K - i)] as number;
      const pi = h[2 * (K - i) + 1] as number;
      const xr = sr[j - i] as number;
      const xi = si[j - i] as number;
      nr += pr * xr - pi * xi;
      ni += pr * xi + pi * xr;
    }
    sr[j] = nr;
    si[j] = ni;
  }
}
