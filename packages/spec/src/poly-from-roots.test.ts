import { describe, expect, it } from 'vitest';
import { polyFromRoots } from './poly-from-roots.js';
import { pairOf, re } from '../test/design-builders.js';

describe('polyFromRoots', () => {
  it('(s + 15)(s^2 + 4 s + 13) = s^3 + 19 s^2 + 73 s + 195, the contract example', () => {
    expect(polyFromRoots([...pairOf(-2, 3), re(-15)])).toEqual([1, 19, 73, 195]);
  });
  it('scales by the leading coefficient and handles no roots', () => {
    expect(polyFromRoots([re(-1), re(-1)], 3)).toEqual([3, 6, 3]);
    expect(polyFromRoots([], 5)).toEqual([5]);
  });
  it('refuses a complex root without its exact conjugate', () => {
    expect(() => polyFromRoots([{ re: -1, im: 2 }])).toThrow();
  });
});
