import { describe, expect, it } from 'vitest';

import { bindRows } from './bind-rows.js';

describe('bindRows', () => {
  it('numbers the parameters row by row', () => {
    expect(bindRows(2, 3)).toBe('($1, $2, $3), ($4, $5, $6)');
  });
  it('gives one group for one row', () => {
    expect(bindRows(1, 1)).toBe('($1)');
  });
});
