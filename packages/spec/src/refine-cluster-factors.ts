// Close roots of a polynomial are ill-determined one by one but their
// factor is not: for two roots 1e-5 apart the sum and product (the factor
// s^2 - (a + b) s + ab) are as well conditioned as any simple root. This
// refines each cluster of computed roots (within 1e-3 of their size of each
// other; complex ones with their conjugates) as a real factor f of p by
// Newton's method on f's coefficients (Bairstow's method, generalised to any
// degree: p = q f + r, and r's Jacobian in f is -(q s^(k-j)) mod f), then
// takes f's roots. parse-design uses it when the clustered roots do not
// reproduce the polynomial (a near-double root taken for an exact one).
import { polyFromRoots } from './poly-from-roots.js';
import { polyRoots } from './poly-roots.js';
import type { Complex } from './types.js';
import { unionGroups } from './union-groups.js';

const NEAR = 1e-3;
const MAX_NEWTON = 40;
/** A Newton step this small (relative to each coefficient) ends the iteration. */
const CONVERGED = 1e-14;
/** The smallest step must be at least this small for the factor to be used. */
const ACCEPTED = 1e-8;

export function refineClusterFactors(monic: readonly number[], roots: readonly Complex[]): Complex[] {
  const upper = roots.filter((z) => z.im >= 0);
  const near = (i: number, j: number): boolean => {
    const a = upper[i] as Complex;
    const b = upper[j] as Complex;
    if ((a.im === 0) !== (b.im === 0)) return false;
    return Math.hypot(a.re - b.re, a.im - b.im) <= NEAR * Math.max(Math.hypot(a.re, a.im), Math.hypot(b.re, b.im));
  };
  const out: Complex[] = [];
  for (const group of unionGroups(upper.length, near)) {
    // the group's roots with their conjugates
    const members: Complex[] = [];
    for (const i of group) {
      const z = upper[i] as Complex;
      members.push(z);
      if (z.im > 0) members.push({ re: z.re, im: -z.im });
    }
    const refined = group.length > 1 ? factorRoots(monic, members) : null;
    out.push(...(refined ?? members));
  }
  return out;
}

// The roots of the refined factor through `members`, or null when Newton
// does not converge.
function factorRoots(monic: readonly number[], members: Complex[]): Complex[] | null {
  const f = polyFromRoots(members);
  const k = f.length - 1;
  if (k >= monic.length - 1) return null; // the whole polynomial: nothing to split off
  // Newton converges quadratically until the remainder's own rounding
  // makes the steps jitter (about 1e-10 of the coefficients for a cluster
  // next to another root); the iterate after the smallest step is kept, and
  // accepted when that step is small. The caller checks the result.
  let best: number[] | null = null;
  let bestChange = Infinity;
  for (let it = 0; it < MAX_NEWTON && bestChange > CONVERGED; it++) {
    const [q, r] = divide(monic, f);
    const jacobian: number[][] = Array.from({ length: k }, () => new Array<number>(k).fill(0));
    for (let j = 1; j <= k; j++) {
      const shifted = q.concat(new Array<number>(k - j).fill(0)); // q s^(k-j)
      const [, rem] = divide(shifted, f);
      for (let i = 0; i < k; i++) (jacobian[i] as number[])[j - 1] = -(rem[i] as number);
    }
    const step = solve(jacobian, r.map((x) => -x));
    if (step === null) break;
    let change = 0;
    for (let j = 0; j < k; j++) {
      f[j + 1] = (f[j + 1] as number) + (step[j] as number);
      change = Math.max(change, Math.abs(step[j] as number) / Math.max(Math.abs(f[j + 1] as number), Number.MIN_VALUE));
    }
    if (!Number.isFinite(change)) break;
    if (change < bestChange) {
      bestChange = change;
      best = f.slice();
    }
  }
  if (best === null || !(bestChange <= ACCEPTED)) return null;
  const found = polyRoots(best, true);
  return found.length === k ? found : null;
}

// p = q f + r for monic f of degree k (k <= deg p): [q, r], r of length k.
function divide(p: readonly number[], f: readonly number[]): [number[], number[]] {
  const k = f.length - 1;
  const w = p.length > k ? p.slice() : new Array<number>(k + 1 - p.length).fill(0).concat(p);
  const n = w.length - 1;
  const q = new Array<number>(n - k + 1).fill(0);
  for (let i = 0; i <= n - k; i++) {
    const t = w[i] as number;
    q[i] = t;
    for (let j = 1; j <= k; j++) w[i + j] = (w[i + j] as number) - t * (f[j] as number);
  }
  return [q, w.slice(n - k + 1)];
}

// Gaussian elimination with partial pivoting; null when singular.
function solve(a: number[][], b: number[]): number[] | null {
  const n = b.length;
  const m = a.map((row) => row.slice());
  const v = b.slice();
  for (let i = 0; i < n; i++) {
    let p = i;
    for (let r = i + 1; r < n; r++) if (Math.abs((m[r] as number[])[i] as number) > Math.abs((m[p] as number[])[i] as number)) p = r;
    const pivot = (m[p] as number[])[i] as number;
    if (pivot === 0 || !Number.isFinite(pivot)) return null;
    [m[i], m[p]] = [m[p] as number[], m[i] as number[]];
    [v[i], v[p]] = [v[p] as number, v[i] as number];
    const mi = m[i] as number[];
    for (let r = i + 1; r < n; r++) {
      const mr = m[r] as number[];
      const factor = (mr[i] as number) / pivot;
      for (let c = i; c < n; c++) mr[c] = (mr[c] as number) - factor * (mi[c] as number);
      v[r] = (v[r] as number) - factor * (v[i] as number);
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let i = n - 1; i >= 0; i--) {
    const mi = m[i] as number[];
    let s = v[i] as number;
    for (let j = i + 1; j < n; j++) s -= (mi[j] as number) * (x[j] as number);
    x[i] = s / (mi[i] as number);
  }
  return x;
}
