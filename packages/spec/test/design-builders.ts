// Test helpers: zero-pole-gain designs scaled to a chosen DC gain.
import type { Complex } from '../src/types.js';

export const re = (x: number): Complex => ({ re: x, im: 0 });
export const pairOf = (sigma: number, omega: number): Complex[] => [
  { re: sigma, im: omega },
  { re: sigma, im: -omega },
];

/** {poles, zeros, gain} with G(0) = dc. */
export function zpkWithDcGain(poles: Complex[], zeros: Complex[] = [], dc = 1): { poles: Complex[]; zeros: Complex[]; gain: number } {
  let num = 1;
  for (const p of poles) num *= p.im === 0 ? -p.re : 1;
  // conjugate pairs: |p|^2 once per pair (count the positive member)
  for (const p of poles) if (p.im > 0) num *= p.re * p.re + p.im * p.im;
  let den = 1;
  for (const z of zeros) den *= z.im === 0 ? -z.re : 1;
  for (const z of zeros) if (z.im > 0) den *= z.re * z.re + z.im * z.im;
  return { poles, zeros, gain: (dc * num) / den };
}
