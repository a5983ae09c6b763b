import { describe, expect, it } from 'vitest';
import { unionGroups } from './union-groups.js';

describe('unionGroups', () => {
  it('joins chains of links, keeps the rest apart, in order of first index', () => {
    // 0-3 and 3-4 chain into one group; 1 and 2 stand alone
    const links = new Set(['0,3', '3,4']);
    expect(unionGroups(5, (i, j) => links.has(`${i},${j}`))).toEqual([[0, 3, 4], [1], [2]]);
  });

  it('no items, no groups', () => {
    expect(unionGroups(0, () => true)).toEqual([]);
  });
});
