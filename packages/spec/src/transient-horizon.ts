// A time T after which the transient part of a stable response stays below
// `threshold` for good: |y(t)/y_f - 1| <= B(t) = sum_k e^{sigma_k t}
// sum_n |C_kn| t^n, and each term of B decreases once t > (m_k - 1)/|sigma_k|,
// so the first T past that point with B(T) < threshold is a true bound.
// Found by doubling and then bisection (to 1 %, which only costs scan time).
import type { PackedResponse } from './pack-response.js';

export function transientBound(p: PackedResponse, t: number): number {
  let b = 0;
  for (let k = 0; k < p.count; k++) {
    if (!p.transient[k]) continue;
    const m = p.degree[k] as number;
    const off = p.offset[k] as number;
    let v = p.bound[off + m - 1] as number;
    for (let n = m - 2; n >= 0; n--) v = v * t + (p.bound[off + n] as number);
    b += Math.exp((p.sigma[k] as number) * t) * v;
  }
  return b;
}

/** Requires every transient term to decay (sigma < 0). */
export function transientHorizon(p: PackedResponse, threshold: number): number {
  let monotone = 0;
  let slowest = Infinity;
  for (let k = 0; k < p.count; k++) {
    if (!p.transient[k]) continue;
    const rate = -(p.sigma[k] as number);
    slowest = Math.min(slowest, rate);
    monotone = Math.max(monotone, ((p.degree[k] as number) - 1) / rate);
  }
  if (slowest === Infinity) return 0;
  if (transientBound(p, monotone) < threshold) return monotone;
  let lo = monotone;
  let step = 1 / slowest;
  let hi = monotone + step;
  while (transientBound(p, hi) >= threshold) {
    lo = hi;
    step *= 2;
    hi += step;
  }
  while (hi - lo > 0.01 * hi) {
    const mid = 0.5 * (lo + hi);
    if (transientBound(p, mid) < threshold) hi = mid;
    else lo = mid;
  }
  return hi;
}
