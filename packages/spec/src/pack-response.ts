// Packs a modal form into flat typed arrays for allocation-free evaluation of
// the response and its first three time derivatives (see eval-response.ts).
// Each term t^n e^{sigma t} (A_n cos wt + B_n sin wt) differentiates into the
// same shape: A'_n = sigma A_n + w B_n + (n+1) A_{n+1},
// B'_n = sigma B_n - w A_n + (n+1) B_{n+1}.
import type { ModalForm } from './partial-fractions.js';
import { magnitude } from './magnitude.js';
import { transientBound } from './transient-horizon.js';

export const PACKED_LEVELS = 4;

export interface PackedResponse {
  count: number;
  sigma: Float64Array;
  omega: Float64Array;
  /** |p| = sqrt(sigma^2 + omega^2): the term's fastest time scale is 1/|p|. */
  speed: Float64Array;
  degree: Int32Array;
  offset: Int32Array;
  /** cos[level][offset + n], sin[level][offset + n], level 0 = value. */
  cos: Float64Array[];
  sin: Float64Array[];
  /**
   * The same coefficients interleaved for the hot loop: term k starts at
   * 2 * PACKED_LEVELS * offset[k]; level l, power n sits at
   * + 2 * (l * degree[k] + n) (cos) and + 1 (sin).
   */
  flat: Float64Array;
  /** sqrt(A_n^2 + B_n^2) of the value: |term| <= e^{sigma t} sum bound_n t^n. */
  bound: Float64Array;
  /** 0 for the constant term of the pole at the origin, 1 for a transient. */
  transient: Uint8Array;
  /** The largest speed among the transient terms. */
  maxSpeed: number;
  /**
   * How many derived steps (term-phases.ts) may follow one direct
   * computation of the phases: each adds about 2 ulps to every phase, so n
   * steps cost at most n * 4.4e-16 * sum(bound) of y_f, kept under 1e-13; 0
   * with a repeated pole, whose t^n terms let that sum grow.
   */
  chainLimit: number;
}

const MAX_CHAIN = 32;
const CHAIN_ERROR = 1e-13;

export function packResponse(form: ModalForm, scale: number): PackedResponse {
  const count = form.terms.length;
  let size = 0;
  for (const t of form.terms) size += t.multiplicity;
  // All the arrays are views on one buffer: one backing store to allocate
  // (and for the collector to track) instead of seventeen.
  const floats = 3 * count + (2 * PACKED_LEVELS + 1) * size + 2 * PACKED_LEVELS * size;
  const buffer = new ArrayBuffer(8 * floats + 4 * 2 * count + count);
  let at = 0;
  const f64 = (n: number): Float64Array => {
    const v = new Float64Array(buffer, at, n);
    at += 8 * n;
    return v;
  };
  const sigma = f64(count);
  const omega = f64(count);
  const speed = f64(count);
  const cos: Float64Array[] = [];
  const sin: Float64Array[] = [];
  for (let level = 0; level < PACKED_LEVELS; level++) {
    cos.push(f64(size));
    sin.push(f64(size));
  }
  const bound = f64(size);
  const flat = f64(2 * PACKED_LEVELS * size);
  const degree = new Int32Array(buffer, at, count);
  const offset = new Int32Array(buffer, at + 4 * count, count);
  const transient = new Uint8Array(buffer, at + 8 * count, count);
  const p: PackedResponse = { count, sigma, omega, speed, degree, offset, cos, sin, bound, transient, flat, maxSpeed: 0, chainLimit: 0 };
  let repeated = false;
  let off = 0;
  form.terms.forEach((t, k) => {
    const m = t.multiplicity;
    p.sigma[k] = t.sigma;
    p.omega[k] = t.omega;
    p.speed[k] = magnitude(t.sigma, t.omega);
    p.degree[k] = m;
    p.offset[k] = off;
    p.transient[k] = t.sigma === 0 && t.omega === 0 ? 0 : 1;
    const c0 = p.cos[0] as Float64Array;
    const s0 = p.sin[0] as Float64Array;
    for (let n = 0; n < m; n++) {
      c0[off + n] = (t.cos[n] as number) * scale;
      s0[off + n] = (t.sin[n] as number) * scale;
      p.bound[off + n] = magnitude(c0[off + n] as number, s0[off + n] as number);
    }
    for (let level = 1; level < PACKED_LEVELS; level++) {
      const pc = p.cos[level - 1] as Float64Array;
      const ps = p.sin[level - 1] as Float64Array;
      const nc = p.cos[level] as Float64Array;
      const ns = p.sin[level] as Float64Array;
      for (let n = 0; n < m; n++) {
        const a = pc[off + n] as number;
        const b = ps[off + n] as number;
        const a1 = n + 1 < m ? (pc[off + n + 1] as number) : 0;
        const b1 = n + 1 < m ? (ps[off + n + 1] as number) : 0;
        nc[off + n] = t.sigma * a + t.omega * b + (n + 1) * a1;
        ns[off + n] = t.sigma * b - t.omega * a + (n + 1) * b1;
      }
    }
    const base = 2 * PACKED_LEVELS * off;
    for (let level = 0; level < PACKED_LEVELS; level++) {
      for (let n = 0; n < m; n++) {
        p.flat[base + 2 * (level * m + n)] = (p.cos[level] as Float64Array)[off + n] as number;
        p.flat[base + 2 * (level * m + n) + 1] = (p.sin[level] as Float64Array)[off + n] as number;
      }
    }
    if (p.transient[k]) {
      p.maxSpeed = Math.max(p.maxSpeed, p.speed[k] as number);
      if (m > 1) repeated = true;
    }
    off += m;
  });
  // without repeated poles the sum of the bounds is the transient bound at t = 0
  p.chainLimit = repeated ? 0 : Math.min(MAX_CHAIN, Math.floor(CHAIN_ERROR / (2 * Number.EPSILON * transientBound(p, 0))));
  return p;
}
