// G(0) = gain * prod(-z) / prod(-p), multiplied and divided in turn so that
// long products neither overflow nor underflow; null when G has a pole at
// the origin (within the axis tolerance, see axis-tolerance.ts).
import type { Model } from './types.js';
import { axisTolerance } from './axis-tolerance.js';
import { magnitude } from './magnitude.js';

export function dcGain(model: Model): number | null {
  const tol = axisTolerance(model.poles);
  if (model.poles.some((p) => magnitude(p.re, p.im) <= tol)) return null;
  let re = model.gain;
  let im = 0;
  const n = Math.max(model.poles.length, model.zeros.length);
  for (let i = 0; i < n; i++) {
    const z = model.zeros[i];
    if (z) {
      // times (0 - z)
      const r = -re * z.re + im * z.im;
      im = -re * z.im - im * z.re;
      re = r;
    }
    const p = model.poles[i];
    if (p) {
      // divided by (0 - p)
      const dr = -p.re;
      const di = -p.im;
      const d = dr * dr + di * di;
      const r = (re * dr + im * di) / d;
      im = (im * dr - re * di) / d;
      re = r;
    }
  }
  return re; // conjugate symmetry makes the imaginary part round-off only
}
