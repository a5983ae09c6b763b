import { describe, expect, it } from 'vitest';

import { ListSyntaxError, parseComplexItem, parseComplexList, parseRealList } from './complex-list.js';

describe('parseComplexItem(item)', () => {
  it.each([
    ['-4', [{ re: -4, im: 0 }]],
    ['2.5e1', [{ re: 25, im: 0 }]],
    ['-2+3j', [{ re: -2, im: 3 }]],
    ['-2-3i', [{ re: -2, im: -3 }]],
    ['-2±3j', [{ re: -2, im: 3 }, { re: -2, im: -3 }]],
    ['-2+-3j', [{ re: -2, im: 3 }, { re: -2, im: -3 }]],
    ['-1e-3+2j', [{ re: -0.001, im: 2 }]],
    ['-2+j', [{ re: -2, im: 1 }]],
    ['3j', [{ re: 0, im: 3 }]],
    ['±3j', [{ re: 0, im: 3 }, { re: 0, im: -3 }]],
  ])('parseComplexItem(%j) reads the number(s) as written', (item, expected) => {
    expect(parseComplexItem(item)).toEqual(expected);
  });

  it.each(['-2+3', 'abc', '-2+3k', '--2', '2j3'])('parseComplexItem(%j) throws a ListSyntaxError naming the item', (item) => {
    expect(() => parseComplexItem(item)).toThrow(ListSyntaxError);
    expect(() => parseComplexItem(item)).toThrow(item);
  });
});

describe('parseComplexList(cell) and parseRealList(cell)', () => {
  it('separates items by spaces or semicolons, in any mix', () => {
    expect(parseComplexList(' -3±4j; -40  -50 ')).toEqual([
      { re: -3, im: 4 },
      { re: -3, im: -4 },
      { re: -40, im: 0 },
      { re: -50, im: 0 },
    ]);
    expect(parseRealList('1; 46 265;1000')).toEqual([1, 46, 265, 1000]);
  });

  it('gives an empty list for an empty cell', () => {
    expect(parseComplexList('')).toEqual([]);
  });

  it('refuses a complex number among coefficients', () => {
    expect(() => parseRealList('1 2+3j')).toThrow(ListSyntaxError);
  });
});
