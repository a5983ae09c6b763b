// Plain-words number formatting for notes: 4 significant figures (more where
// a note must tell two close values apart), exponent form from a million, a sign on
// positive real parts ("+0.5", the way engineers name a right-half-plane
// pole), and a conjugate pair written once as "-2 ± 3j".
import type { Complex } from './types.js';

export function formatNumber(x: number, digits = 4): string {
  if (x === 0) return '0';
  const rounded = Number(x.toPrecision(digits));
  // a million and up as "2.128e19", not twenty digits of a rounded value
  if (Math.abs(rounded) >= 1e6 && Number.isFinite(rounded)) {
    const [mantissa, exponent] = rounded.toExponential(digits - 1).split('e');
    return `${String(Number(mantissa))}e${Number(exponent)}`;
  }
  return String(rounded);
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
