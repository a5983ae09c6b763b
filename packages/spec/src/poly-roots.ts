// Roots of a real polynomial (coefficients highest power first) by the
// Aberth–Ehrlich simultaneous iteration (O. Aberth, Math. Comp. 27, 1973;
// L. W. Ehrlich, Comm. ACM 10, 1967), as organised by D. A. Bini, "Numerical
// computation of polynomial zeros by means of Aberth's method", Numerical
// Algorithms 13 (1996):
//  - starting points on circles whose radii come from the Newton polygon of
//    log|a_k| (one circle per hull edge), so roots of very different
//    magnitudes each start near their own size;
//  - Horner on p(z) for |z| <= 1 and on the reversed polynomial for |z| > 1,
//    so large roots never overflow;
//  - each root stops when |p(z)| falls to the rounding level of its own
//    evaluation (a backward-error test), then a Newton polish.
// Afterwards the result is made exactly conjugate-symmetric and numerically
// repeated roots are clustered: a multiple root comes out spread by about
// eps^(1/m), and two roots whose Newton inclusion disks (radius
// n |p(z)| / |p'(z)|, rounding included) overlap cannot be told apart, so the
// cluster is replaced by its mean (which is well conditioned) repeated m times.
import type { Complex } from './types.js';
import { sortRoots } from './sort-roots.js';
import { unionGroups } from './union-groups.js';

const EPS = 2.220446049250313e-16;
const MAX_ITERATIONS = 600;
// A root stops iterating when |p(z)| <= STOP_FACTOR * eps * sum |a_i| |z|^i.
const STOP_FACTOR = 2;
// Disks of badly conditioned (not repeated) roots can be wide; roots farther
// apart than 1 % of their size are never merged or moved onto the real axis.
// That still covers an m-fold root up to m = 7 (spread about eps^(1/m)).
const CLUSTER_CAP = 1e-2;

/**
 * separate: keep every root as found and polished, with no clustering and no
 * move onto the real axis beyond round-off (parse-design falls back to this
 * when the clustered roots do not reproduce the polynomial).
 */
export function polyRoots(coeffs: readonly number[], separate = false): Complex[] {
  let first = 0;
  while (first < coeffs.length && coeffs[first] === 0) first++;
  if (first === coeffs.length) return [];
  let last = coeffs.length - 1;
  let zerosAtOrigin = 0;
  while (last > first && coeffs[last] === 0) {
    last--;
    zerosAtOrigin++;
  }
  const lead = coeffs[first] as number;
  const c: number[] = [];
  for (let i = first; i <= last; i++) c.push((coeffs[i] as number) / lead);
  const roots = c.length <= 3 ? lowDegreeRoots(c) : aberthRoots(c, separate);
  for (let i = 0; i < zerosAtOrigin; i++) roots.push({ re: 0, im: 0 });
  return sortRoots(roots);
}

function lowDegreeRoots(c: number[]): Complex[] {
  if (c.length === 1) return [];
  if (c.length === 2) return [{ re: -(c[1] as number), im: 0 }];
  // monic quadratic s^2 + b s + d with d != 0 (zero roots were split off)
  const b = c[1] as number;
  const d = c[2] as number;
  const disc = b * b - 4 * d;
  // a discriminant inside its own rounding level is a double root
  if (Math.abs(disc) <= 8 * EPS * (b * b + 4 * Math.abs(d))) {
    return [{ re: -b / 2, im: 0 }, { re: -b / 2, im: 0 }];
  }
  if (disc > 0) {
    const q = -0.5 * (b + (b >= 0 ? 1 : -1) * Math.sqrt(disc));
    return [{ re: q, im: 0 }, { re: d / q, im: 0 }];
  }
  const im = 0.5 * Math.sqrt(-disc);
  return [{ re: -b / 2, im }, { re: -b / 2, im: -im }];
}

// Scratch for one evaluation: p, p' (or the reversed forms), error bound.
interface Evaluation {
  /** Newton correction p(z)/p'(z). */
  nr: number;
  ni: number;
  /** |p(z)| relative to its rounding level: <= 1 means "as good as it gets". */
  backward: number;
  /** Newton inclusion radius n |p| / |p'| with the rounding level included. */
  radius: number;
}

function evaluate(c: number[], x: number, y: number, out: Evaluation): void {
  const n = c.length - 1;
  const mod = Math.hypot(x, y);
  if (mod <= 1) {
    let pr = c[0] as number;
    let pi = 0;
    let dr = 0;
    let di = 0;
    let eb = Math.abs(pr);
    for (let i = 1; i <= n; i++) {
      const tr = dr * x - di * y + pr;
      di = dr * y + di * x + pi;
      dr = tr;
      const ur = pr * x - pi * y + (c[i] as number);
      pi = pr * y + pi * x;
      pr = ur;
      eb = eb * mod + Math.abs(c[i] as number);
    }
    const level = 8 * EPS * eb * n;
    const pm = Math.hypot(pr, pi);
    const dm = Math.hypot(dr, di);
    out.backward = pm / (STOP_FACTOR * EPS * eb);
    if (dm === 0) {
      out.nr = pm === 0 ? 0 : 1e-3 * (1 + mod);
      out.ni = 0;
      out.radius = Math.sqrt(EPS) * Math.max(mod, 1e-300);
      return;
    }
    const den = dr * dr + di * di;
    out.nr = (pr * dr + pi * di) / den;
    out.ni = (pi * dr - pr * di) / den;
    out.radius = (n * (pm + level)) / dm;
    return;
  }
  // |z| > 1: work with w = 1/z and q(w) = w^n p(1/w), whose coefficients are c reversed.
  const m2 = x * x + y * y;
  const wr = x / m2;
  const wi = -y / m2;
  const wm = 1 / mod;
  let qr = c[n] as number;
  let qi = 0;
  let dr = 0;
  let di = 0;
  let eb = Math.abs(qr);
  for (let i = n - 1; i >= 0; i--) {
    const tr = dr * wr - di * wi + qr;
    di = dr * wi + di * wr + qi;
    dr = tr;
    const ur = qr * wr - qi * wi + (c[i] as number);
    qi = qr * wi + qi * wr;
    qr = ur;
    eb = eb * wm + Math.abs(c[i] as number);
  }
  const level = 8 * EPS * eb * n;
  const qm = Math.hypot(qr, qi);
  out.backward = qm / level;
  // p/p' = z q / (n q - w q')
  const er = n * qr - (wr * dr - wi * di);
  const ei = n * qi - (wr * di + wi * dr);
  const em = Math.hypot(er, ei);
  if (em === 0) {
    out.nr = qm === 0 ? 0 : 1e-3 * mod;
    out.ni = 0;
    out.radius = Math.sqrt(EPS) * mod;
    return;
  }
  const fr = x * qr - y * qi;
  const fi = x * qi + y * qr;
  const den = er * er + ei * ei;
  out.nr = (fr * er + fi * ei) / den;
  out.ni = (fi * er - fr * ei) / den;
  out.radius = (n * mod * (qm + level)) / em;
}

function aberthRoots(c: number[], separate: boolean): Complex[] {
  const n = c.length - 1;
  const zr = new Float64Array(n);
  const zi = new Float64Array(n);
  initialGuesses(c, zr, zi);
  const done = new Uint8Array(n);
  const ev: Evaluation = { nr: 0, ni: 0, backward: 0, radius: 0 };
  for (let it = 0; it < MAX_ITERATIONS; it++) {
    let active = 0;
    for (let k = 0; k < n; k++) {
      if (done[k]) continue;
      const x = zr[k] as number;
      const y = zi[k] as number;
      evaluate(c, x, y, ev);
      if (ev.backward <= 1) {
        done[k] = 1;
        continue;
      }
      active++;
      // Aberth: w = N / (1 - N * sum_j 1/(z_k - z_j))
      let sr = 0;
      let si = 0;
      for (let j = 0; j < n; j++) {
        if (j === k) continue;
        const ar = x - (zr[j] as number);
        const ai = y - (zi[j] as number);
        const am = ar * ar + ai * ai;
        if (am === 0) continue;
        sr += ar / am;
        si -= ai / am;
      }
      const gr = 1 - (ev.nr * sr - ev.ni * si);
      const gi = -(ev.nr * si + ev.ni * sr);
      const gm = gr * gr + gi * gi;
      let wr = ev.nr;
      let wi = ev.ni;
      if (gm !== 0) {
        wr = (ev.nr * gr + ev.ni * gi) / gm;
        wi = (ev.ni * gr - ev.nr * gi) / gm;
      }
      zr[k] = x - wr;
      zi[k] = y - wi;
      if (Math.hypot(wr, wi) <= 2 * EPS * Math.hypot(x, y)) done[k] = 1;
    }
    if (active === 0) break;
  }
  return symmetrize(c, zr, zi, ev, separate);
}

// Bini's starting points: the upper convex hull of (k, log|a_k|), a_k the
// coefficient of z^k, gives for each edge a radius and a number of roots.
function initialGuesses(c: number[], zr: Float64Array, zi: Float64Array): void {
  const n = c.length - 1;
  const hull: number[] = [];
  const logA = (k: number) => Math.log(Math.abs(c[n - k] as number));
  for (let k = 0; k <= n; k++) {
    if (c[n - k] === 0) continue;
    while (hull.length >= 2) {
      const o = hull[hull.length - 2] as number;
      const a = hull[hull.length - 1] as number;
      const cross = (a - o) * (logA(k) - logA(o)) - (logA(a) - logA(o)) * (k - o);
      if (cross >= 0) hull.pop();
      else break;
    }
    hull.push(k);
  }
  let idx = 0;
  for (let e = 0; e + 1 < hull.length; e++) {
    const k0 = hull[e] as number;
    const k1 = hull[e + 1] as number;
    const count = k1 - k0;
    const radius = Math.exp((logA(k0) - logA(k1)) / count);
    for (let j = 0; j < count; j++) {
      const theta = (2 * Math.PI * j) / count + (2 * Math.PI * e) / n + 0.4;
      zr[idx] = radius * Math.cos(theta);
      zi[idx] = radius * Math.sin(theta);
      idx++;
    }
  }
}

interface Cluster {
  re: number;
  im: number;
  radius: number;
  members: Complex[];
}

function symmetrize(c: number[], zr: Float64Array, zi: Float64Array, ev: Evaluation, separate: boolean): Complex[] {
  const n = zr.length;
  const radius = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    evaluate(c, zr[k] as number, zi[k] as number, ev);
    radius[k] = ev.radius;
  }
  // 1. A root whose inclusion disk touches the real axis is real.
  const reals: Cluster[] = [];
  const uppers: Cluster[] = [];
  const lowers: Cluster[] = [];
  for (let k = 0; k < n; k++) {
    const r = radius[k] as number;
    const im = zi[k] as number;
    const item: Cluster = { re: zr[k] as number, im, radius: r, members: [] };
    const realReach = separate ? 16 * EPS * Math.hypot(item.re, im) : Math.min(r, CLUSTER_CAP * Math.hypot(item.re, im));
    if (Math.abs(im) <= realReach) reals.push({ ...item, im: 0 });
    else if (im > 0) uppers.push(item);
    else lowers.push(item);
  }
  // 2. Pair each upper root with the nearest lower one; the pair becomes an
  //    exact conjugate pair at the average. An unpaired leftover is taken as real.
  const pairs: Cluster[] = [];
  const lowerUsed = new Uint8Array(lowers.length);
  for (const u of uppers) {
    let best = -1;
    let bestD = Infinity;
    for (let j = 0; j < lowers.length; j++) {
      if (lowerUsed[j]) continue;
      const l = lowers[j] as Cluster;
      const d = Math.hypot(u.re - l.re, u.im + l.im);
      if (d < bestD) {
        bestD = d;
        best = j;
      }
    }
    if (best < 0) {
      reals.push({ ...u, im: 0 });
      continue;
    }
    lowerUsed[best] = 1;
    const l = lowers[best] as Cluster;
    pairs.push({ re: (u.re + l.re) / 2, im: (u.im - l.im) / 2, radius: Math.max(u.radius, l.radius), members: [] });
  }
  lowers.forEach((l, j) => {
    if (!lowerUsed[j]) reals.push({ ...l, im: 0 });
  });
  const out: Complex[] = [];
  if (separate) {
    for (const u of reals) out.push({ ...polish(c, u.re, 0, ev), im: 0 });
    for (const u of pairs) {
      const z = polish(c, u.re, u.im, ev);
      const im = z.im > 0 ? z.im : u.im;
      out.push({ re: z.re, im }, { re: z.re, im: -im });
    }
    return out;
  }
  // 3. A real root of high multiplicity comes out as a ring of reals and
  //    pairs around it: find those rings first, as one cluster each.
  const rings = realRings(c, reals, pairs, ev);
  out.push(...rings.roots);
  // 4. Cluster the rest by overlapping inclusion disks, 5. polish.
  for (const cl of clusterByDisks(rings.reals)) {
    for (const z of resolveCluster(c, cl, ev)) out.push({ re: z.re, im: 0 });
  }
  for (const cl of clusterByDisks(rings.pairs)) {
    for (const z of resolveCluster(c, cl, ev)) {
      const im = z.im > 0 ? z.im : cl.im; // polishing never moves a pair onto the axis
      out.push({ re: z.re, im }, { re: z.re, im: -im });
    }
  }
  return out;
}

// Rings: real roots and upper members of pairs whose inclusion disks overlap,
// within RING_CAP of their size, a pair among them and two members at least. Such a
// ring of total multiplicity m is one m-fold real root when the refined
// centre passes resolveCluster's test; otherwise its members go on to the
// separate real and pair clustering below. (Clustering reals and pairs
// apart split a 7-fold root into sub-clusters whose refined centres drifted,
// so the root set no longer summed to -a_1.) RING_CAP is wider than
// CLUSTER_CAP because the multiple-root test, not the distance, decides:
// eps^(1/m) reaches 0.2 at m = 22.
const RING_CAP = 0.2;

function realRings(c: number[], reals: Cluster[], pairs: Cluster[], ev: Evaluation): { roots: Complex[]; reals: Cluster[]; pairs: Cluster[] } {
  const items = [...reals, ...pairs];
  const roots: Complex[] = [];
  const taken = new Uint8Array(items.length);
  for (const members of diskGroups(items, RING_CAP)) {
    // reals alone, or pairs alone: the usual clustering (a lone pair taken
    // for a double real root would leave the model)
    const pairCount = members.filter((i) => i >= reals.length).length;
    if (pairCount === 0 || (pairCount === 1 && members.length === 1)) continue;
    let m = 0;
    let sum = 0;
    for (const i of members) {
      const w = i >= reals.length ? 2 : 1;
      m += w;
      sum += w * (items[i] as Cluster).re;
    }
    const centre = multipleRoot(c, m, sum / m, 0, ev);
    if (centre === null) continue;
    for (let j = 0; j < m; j++) roots.push({ re: centre.re, im: 0 });
    for (const i of members) taken[i] = 1;
  }
  return {
    roots,
    reals: reals.filter((_, i) => !taken[i]),
    pairs: pairs.filter((_, i) => !taken[reals.length + i]),
  };
}

// The refined centre of an m-fold root near (re, im), or null when p, ...,
// p^(m-2) do not all vanish there to rounding level (see resolveCluster).
function multipleRoot(c: number[], m: number, re: number, im: number, ev: Evaluation): Complex | null {
  const z = polish(derivative(c, m - 1), re, im, ev);
  let d = c;
  for (let j = 0; j < m - 1; j++, d = derivative(d, 1)) {
    evaluate(d, z.re, z.im, ev);
    if (!(ev.backward <= MULTIPLE_ROOT_CHECK)) return null;
  }
  return z;
}

// A cluster of m overlapping disks is taken as one m-fold root only when the
// refined centre (Newton on p^(m-1)) also makes p, ..., p^(m-2) vanish to
// rounding level. Otherwise the points are distinct but ill-conditioned
// roots, and each member is polished and kept on its own.
const MULTIPLE_ROOT_CHECK = 1e3;

function resolveCluster(c: number[], cl: Cluster, ev: Evaluation): Complex[] {
  if (cl.members.length === 1) return [polish(c, cl.re, cl.im, ev)];
  const z = multipleRoot(c, cl.members.length, cl.re, cl.im, ev);
  if (z !== null) return cl.members.map(() => ({ re: z.re, im: z.im }));
  return cl.members.map((w) => polish(c, w.re, w.im, ev));
}

// Indices of the items whose inclusion disks overlap, directly or in a
// chain, and which lie within `cap` of their size of each other: one list
// per group, in the order of each group's first item.
function diskGroups(items: Cluster[], cap: number): number[][] {
  return unionGroups(items.length, (i, j) => {
    const a = items[i] as Cluster;
    const b = items[j] as Cluster;
    const d = Math.hypot(a.re - b.re, a.im - b.im);
    return d <= a.radius + b.radius && d <= cap * Math.max(Math.hypot(a.re, a.im), Math.hypot(b.re, b.im));
  });
}

function clusterByDisks(items: Cluster[]): Cluster[] {
  return diskGroups(items, CLUSTER_CAP).map((group) => {
    const members = group.map((i) => ({ re: (items[i] as Cluster).re, im: (items[i] as Cluster).im }));
    let re = 0;
    let im = 0;
    for (const w of members) {
      re += w.re;
      im += w.im;
    }
    return { re: re / members.length, im: im / members.length, radius: 0, members };
  });
}

// The k-th derivative's coefficients: an m-fold root of p is a simple root of
// p^(m-1), so Newton on that derivative pins a cluster's centre to full
// accuracy instead of leaving it at the mean of eps^(1/m)-spread points.
function derivative(c: number[], k: number): number[] {
  let d = c;
  for (let j = 0; j < k; j++) {
    const n = d.length - 1;
    d = d.slice(0, n).map((v, i) => v * (n - i));
  }
  return d;
}

// A few Newton steps on an isolated root; a step is kept only when it lowers
// the backward error, so a polish can never make a root worse.
function polish(c: number[], re: number, im: number, ev: Evaluation): Complex {
  let x = re;
  let y = im;
  evaluate(c, x, y, ev);
  let best = ev.backward;
  for (let it = 0; it < 8 && best > 0; it++) {
    const nx = x - ev.nr;
    const ny = y - ev.ni;
    const step = Math.hypot(ev.nr, ev.ni);
    evaluate(c, nx, ny, ev);
    if (!(ev.backward < best)) break;
    x = nx;
    y = ny;
    best = ev.backward;
    if (step <= EPS * Math.hypot(x, y)) break;
  }
  return { re: x, im: y };
}
