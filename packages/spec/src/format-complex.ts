// Plain-words number formatting for notes: 4 significant figures (more where
// a note must tell two close values apart), a sign on
// positive real parts ("+0.5", the way engineers name a right-half-plane
// pole), and a conjugate pair written once as "-2 ± 3j".
import type { Complex } from './types.js';

export function formatNumber(x: number, digits = 4): string {
  if (x === 0) return '0';
  return String(Number(x.toPrecision(digits)));
}

export function formatSigned(x: number, digits = 4): string {
  return x > 0 ? `+${formatNumber(x, digits)}` : formatNumber(x, digits);
}

/** A real root as "+0.5" / "-4"; a complex one as its pair "-2 ± 3j" or "±2j". */
export function formatRoot(z: Complex, digits = 4): string {
  if (z.im === 0) return formatSigned(z.re, digits);
  const im = `${formatNumber(Math.abs(z.im), digits)}j`;
  return z.re === 0 ? `±${im}` : `${formatSigned(z.re, digits)} ± ${im}`;
}
