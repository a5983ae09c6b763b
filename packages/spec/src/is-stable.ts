// Stability of the closed-loop model from its poles, with the reason in
// plain words. A pole with Re p > 0 is unstable; a pole on the imaginary axis
// (|Re p| within the axis tolerance of axis-tolerance.ts, including poles at
// the origin, i.e. integrators) is marginally stable. Both give stable false,
// since neither response settles to a final value.
import type { Complex, Model } from './types.js';
import { axisTolerance } from './axis-tolerance.js';
import { formatRoot } from './format-complex.js';

export function stability(model: Model): { stable: boolean; reason: string | null } {
  const tol = axisTolerance(model.poles);
  let rightmost: Complex | null = null;
  for (const p of model.poles) if (!rightmost || p.re > rightmost.re) rightmost = p;
  if (!rightmost || rightmost.re < -tol) return { stable: true, reason: null };
  const p = rightmost;
  const count = model.poles.filter((q) => Math.abs(q.re - p.re) <= tol && Math.abs(q.im - p.im) <= tol).length;
  const name = formatRoot(p);
  const plural = p.im !== 0;
  if (p.re > tol) {
    return {
      stable: false,
      reason: `the ${plural ? 'poles' : 'pole'} at ${name} ${plural ? 'are' : 'is'} in the right half-plane, so the response grows without bound`,
    };
  }
  if (Math.abs(p.im) <= tol) {
    if (count > 1) return { stable: false, reason: `the ${count} poles at 0 make the response grow without settling` };
    return { stable: false, reason: 'the pole at 0 makes the response ramp without settling' };
  }
  if (count > 1) {
    return { stable: false, reason: `the repeated poles at ${formatRoot({ re: 0, im: p.im })} make the response grow without bound` };
  }
  return { stable: false, reason: `the poles at ${formatRoot({ re: 0, im: p.im })} make the response oscillate without settling` };
}
