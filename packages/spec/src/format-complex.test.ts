import { describe, expect, it } from 'vitest';
import { formatNumber, formatRoot } from './format-complex.js';

describe('formatNumber and formatRoot (the numbers in notes)', () => {
  it('four significant figures, trailing zeros dropped', () => {
    expect(formatNumber(3.3333333333333335)).toBe('3.333');
    expect(formatNumber(2)).toBe('2');
    expect(formatNumber(-0.000123456)).toBe('-0.0001235');
    expect(formatNumber(123456)).toBe('123500');
  });

  it('a million and up in exponent form, without a plus sign or trailing zeros', () => {
    expect(formatNumber(21280000000000000000)).toBe('2.128e19');
    expect(formatNumber(800000000)).toBe('8e8');
    expect(formatNumber(-1234567)).toBe('-1.235e6');
    expect(formatNumber(999999.9)).toBe('1e6');
  });

  it('roots: a sign on positive real parts, a conjugate pair written once', () => {
    expect(formatRoot({ re: 0.5, im: 0 })).toBe('+0.5');
    expect(formatRoot({ re: -2, im: 3 })).toBe('-2 ± 3j');
    expect(formatRoot({ re: 0, im: -2 })).toBe('±2j');
  });
});
