import { describe, expect, it } from 'vitest';
import { designSchema, complexSchema } from './design.js';

describe('designSchema', () => {
  it.each([
    [{ poles: [{ re: -2, im: 3 }, { re: -2, im: -3 }, { re: -15, im: 0 }], zeros: [], gain: 195 }, true],
    [{ numerator: [195], denominator: [1, 19, 73, 195], id: 'c-1' }, true],
    [{ poles: [{ re: -1, im: Number.NaN }], gain: 1 }, false],
    [{ numerator: [1], denominator: [1, Infinity] }, false],
    [{ numerator: [], denominator: [1] }, false],
    [{ poles: [], gain: 1, numerator: [1] }, false],
    [{ poles: Array.from({ length: 201 }, () => ({ re: -1, im: 0 })), gain: 1 }, false],
  ])('%j -> %s', (input, ok) => {
    expect(designSchema.safeParse(input).success).toBe(ok);
  });
  it('complexSchema wants both parts', () => {
    expect(complexSchema.safeParse({ re: 1 }).success).toBe(false);
  });
});
