// Expands prod (s - r_i) into real coefficients, highest power first.
// Conjugate pairs are multiplied in as real quadratics s^2 - 2 Re(r) s + |r|^2,
// so no imaginary round-off enters the coefficients. The caller guarantees
// that every non-real root comes with its exact conjugate (parse-design does).
import type { Complex } from './types.js';

export function polyFromRoots(roots: readonly Complex[], leading = 1): number[] {
  let c: number[] = [leading];
  const usedConjugate = new Array<boolean>(roots.length).fill(false);
  for (let i = 0; i < roots.length; i++) {
    if (usedConjugate[i]) continue;
    const r = roots[i] as Complex;
    if (r.im === 0) {
      c = multiplyLinear(c, -r.re);
      continue;
    }
    const j = findConjugate(roots, usedConjugate, i);
    if (j < 0) throw new Error('polyFromRoots: a complex root has no conjugate');
    usedConjugate[j] = true;
    c = multiplyQuadratic(c, -2 * r.re, r.re * r.re + r.im * r.im);
  }
  return c;
}

function findConjugate(roots: readonly Complex[], used: boolean[], i: number): number {
  const r = roots[i] as Complex;
  for (let j = i + 1; j < roots.length; j++) {
    const q = roots[j] as Complex;
    if (!used[j] && q.re === r.re && q.im === -r.im) return j;
  }
  return -1;
}

// (c) * (s + a)
function multiplyLinear(c: number[], a: number): number[] {
  const out = new Array<number>(c.length + 1).fill(0);
  for (let k = 0; k < c.length; k++) {
    const ck = c[k] as number;
    out[k] = (out[k] as number) + ck;
    out[k + 1] = (out[k + 1] as number) + ck * a;
  }
  return out;
}

// (c) * (s^2 + b s + d)
function multiplyQuadratic(c: number[], b: number, d: number): number[] {
  const out = new Array<number>(c.length + 2).fill(0);
  for (let k = 0; k < c.length; k++) {
    const ck = c[k] as number;
    out[k] = (out[k] as number) + ck;
    out[k + 1] = (out[k + 1] as number) + ck * b;
    out[k + 2] = (out[k + 2] as number) + ck * d;
  }
  return out;
}
