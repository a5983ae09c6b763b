// Plain-words number formatting for notes: 4 significant figures, a sign on
// positive real parts ("+0.5", the way engineers name a right-half-plane
// pole), and a conjugate pair written once as "-2 ± 3j".
import type { Complex } from './types.js';

export function formatNumber(x: number): string {
  if (x === 0) return '0';
  return String(Number(x.toPrecision(4)));
}

export function formatSigned(x: number): string {
  return x > 0 ? `+${formatNumber(x)}` : formatNumber(x);
}

/** A real root as "+0.5" / "-4"; a complex one as its pair "-2 ± 3j" or "±2j". */
export function formatRoot(z: Complex): string {
  if (z.im === 0) return formatSigned(z.re);
  const im = `${formatNumber(Math.abs(z.im))}j`;
  return z.re === 0 ? `±${im}` : `${formatSigned(z.re)} ± ${im}`;
}
