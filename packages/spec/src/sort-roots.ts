// The order types.ts promises for poles and zeros: real part descending
// (slowest first); at equal real part the smaller |imaginary part| first
// (a real root before a pair), and within a pair the positive part first, so
// conjugates end up adjacent.
import type { Complex } from './types.js';

export function sortRoots(roots: readonly Complex[]): Complex[] {
  return [...roots].sort(
    (a, b) => b.re - a.re || Math.abs(a.im) - Math.abs(b.im) || b.im - a.im,
  );
}
