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
// Clustering: poles closer than 1e-5 of their size are merged into one
// repeated pole at their mean. Merging two poles delta apart changes the
// response by O(delta^2); keeping them apart costs eps/delta through the
// cancelling residues; 1e-5 sits near the balance eps^(1/3) ~ 6e-6, so either
// way the error stays near 1e-10.
//
// Y is strictly proper, so there is no impulse at t = 0; the feedthrough
// D = G(inf) is reported because y(0+) = D.
import type { Complex, Model } from './types.js';
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
}

export function partialFractions(model: Model): ModalForm {
  const groups = clusterPoles([...model.poles, { re: 0, im: 0 }]);
  const terms: ModalTerm[] = [];
  for (let g = 0; g < groups.length; g++) {
    const q = groups[g] as Group;
    if (q.im < 0) continue; // the conjugate of a pair that is handled once
    const m = q.m;
    const sr = new Float64Array(m);
    const si = new Float64Array(m);
    sr[0] = model.gain;
    const zeros = model.zeros;
    const others: Complex[] = [];
    for (let k = 0; k < groups.length; k++) {
      if (k === g) continue;
      const o = groups[k] as Group;
      for (let j = 0; j < o.m; j++) others.push(o);
    }
    const steps = Math.max(zeros.length, others.length);
    for (let i = 0; i < steps; i++) {
      const z = zeros[i];
      if (z) multiplyLinear(sr, si, q.re - z.re, q.im - z.im);
      const r = others[i];
      if (r) divideLinear(sr, si, q.re - r.re, q.im - r.im);
    }
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

function clusterPoles(poles: Complex[]): Group[] {
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
      if (d <= POLE_CLUSTER_TOLERANCE * Math.max(size[i] as number, size[j] as number)) {
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
      out.push({ re: 0, im: 0, m: 0 });
    }
    const group = out[g] as Group;
    group.re += a.re;
    group.im += a.im;
    group.m++;
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
