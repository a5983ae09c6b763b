import { describe, expect, it } from 'vitest';

import { formatComplex, formatNumber, formatQuantity, formatSignedPercent, parseNumberInput, parseNumberList } from './format';

describe('formatNumber', () => {
  it.each([
    [0.18987275833308664, '0.1899'],
    [9.392588316446027, '9.393'],
    [32, '32'],
    [1560, '1560'],
    [-19.2, '-19.2'],
    [0, '0'],
    [-0.00001234, '-1.234e-5'],
    [256000000, '2.56e8'],
  ])('formatNumber(%s) is %s (4 significant figures)', (value, text) => {
    expect(formatNumber(value)).toBe(text);
  });

  it('formatNumber(null) and NaN give a dash, never "NaN"', () => {
    expect(formatNumber(null)).toBe('—');
    expect(formatNumber(Number.NaN)).toBe('—');
  });
});

describe('formatQuantity and formatComplex', () => {
  it('puts the unit after the number and leaves it off a missing value', () => {
    expect(formatQuantity(0.3, 's')).toBe('0.3 s');
    expect(formatQuantity(null, 's')).toBe('—');
  });
  it.each([
    [{ re: -2, im: 3 }, '-2 + 3j'],
    [{ re: -2, im: -3 }, '-2 - 3j'],
    [{ re: 0, im: 4 }, '4j'],
    [{ re: -15, im: 0 }, '-15'],
  ])('formatComplex(%o) is %s', (c, text) => {
    expect(formatComplex(c)).toBe(text);
  });
  it('formatSignedPercent spells out the sign', () => {
    expect(formatSignedPercent(21.72843)).toBe('+21.73 %');
    expect(formatSignedPercent(-4.2)).toBe('-4.2 %');
  });
});

describe('parseNumberInput', () => {
  it.each([
    ['0.5', 0.5],
    ['5e-1', 0.5],
    [' -.25 ', -0.25],
    ['1.5E3', 1500],
    ['\u22122', -2],
    ['+3', 3],
  ])('reads %j as %s', (text, value) => {
    expect(parseNumberInput(text)).toBe(value);
  });
  it.each(['', 'abc', '0x10', 'Infinity', '1,5', '2j', '1e999'])('refuses %j', (text) => {
    expect(parseNumberInput(text)).toBeNull();
  });
});

describe('parseNumberList', () => {
  it('reads "1, 19, 73, 195" highest power first, as typed', () => {
    expect(parseNumberList('1, 19, 73, 195')).toEqual({ ok: true, values: [1, 19, 73, 195] });
    expect(parseNumberList('1 38;292  1560')).toEqual({ ok: true, values: [1, 38, 292, 1560] });
  });
  it('names the item that is not a number', () => {
    const result = parseNumberList('1, x, 3');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toContain('Item 2');
  });
  it('refuses an empty list', () => {
    expect(parseNumberList('  ').ok).toBe(false);
  });
});
