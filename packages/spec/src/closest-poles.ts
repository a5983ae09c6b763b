// The two poles of a model closest to each other, relative to their size:
// what a note names when nearly repeated poles make the modal form cancel.
import { magnitude } from './magnitude.js';
import type { Complex } from './types.js';

export interface ClosestPoles {
  a: Complex;
  b: Complex;
  /** |a - b| / max(|a|, |b|) */
  relative: number;
}

export function closestPoles(poles: readonly Complex[]): ClosestPoles | null {
  let best: ClosestPoles | null = null;
  for (let i = 0; i < poles.length; i++) {
    const a = poles[i] as Complex;
    for (let j = i + 1; j < poles.length; j++) {
      const b = poles[j] as Complex;
      const size = Math.max(magnitude(a.re, a.im), magnitude(b.re, b.im));
      if (size === 0) continue;
      const relative = magnitude(a.re - b.re, a.im - b.im) / size;
      if (!best || relative < best.relative) best = { a, b, relative };
    }
  }
  return best;
}
