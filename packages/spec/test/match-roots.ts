// Test helper: the largest distance between two multisets of complex numbers
// under a greedy nearest-neighbour matching, relative to max(|z|, floor).
import type { Complex } from '../src/types.js';

export function maxMatchedError(actual: readonly Complex[], expected: readonly Complex[], floor = 1): number {
  if (actual.length !== expected.length) return Infinity;
  const used = new Array<boolean>(expected.length).fill(false);
  let worst = 0;
  for (const a of actual) {
    let best = -1;
    let bestD = Infinity;
    expected.forEach((e, j) => {
      if (used[j]) return;
      const d = Math.hypot(a.re - e.re, a.im - e.im);
      if (d < bestD) {
        bestD = d;
        best = j;
      }
    });
    used[best] = true;
    const e = expected[best] as Complex;
    worst = Math.max(worst, bestD / Math.max(Math.hypot(e.re, e.im), floor));
  }
  return worst;
}
