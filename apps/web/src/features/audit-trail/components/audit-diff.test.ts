import { describe, expect, it } from 'vitest';

import { auditDiff, showValue } from './audit-diff';

describe('auditDiff(before, after)', () => {
  it('marks each field changed, added, removed or unchanged, changed ones first', () => {
    const rows = auditDiff({ name: 'A', status: 'draft', notes: 'x', version: 1 }, { name: 'A', status: 'in_review', version: 2, submittedAt: 't' });
    expect(rows.map((r) => [r.path, r.change])).toEqual([
      ['status', 'changed'],
      ['version', 'changed'],
      ['submittedAt', 'added'],
      ['notes', 'removed'],
      ['name', 'unchanged'],
    ]);
    expect(rows[0]).toEqual({ path: 'status', before: 'draft', after: 'in_review', change: 'changed' });
  });

  it('walks into nested objects and names the field by its path', () => {
    const rows = auditDiff({ requirements: { maxOvershootPct: 10, maxSettlingTime: 2 } }, { requirements: { maxOvershootPct: 5, maxSettlingTime: 2 } });
    expect(rows.map((r) => [r.path, r.change])).toEqual([
      ['requirements.maxOvershootPct', 'changed'],
      ['requirements.maxSettlingTime', 'unchanged'],
    ]);
  });

  it('compares arrays whole and ignores the key order of objects inside them', () => {
    expect(auditDiff({ poles: [{ re: -1, im: 2 }] }, { poles: [{ im: 2, re: -1 }] })[0]!.change).toBe('unchanged');
    expect(auditDiff({ poles: [1, 2] }, { poles: [2, 1] })[0]!.change).toBe('changed');
  });

  it('reads a missing record (before a creation) as empty: every field is added', () => {
    expect(auditDiff(null, { id: 3, name: 'Line' }).map((r) => r.change)).toEqual(['added', 'added']);
    expect(auditDiff(null, null)).toEqual([]);
  });

  it('treats a value turning into null as a change, not a removal', () => {
    expect(auditDiff({ approverId: 4 }, { approverId: null })[0]!.change).toBe('changed');
  });
});

describe('showValue(value)', () => {
  it.each([
    ['text', 'text'],
    ['', '(empty text)'],
    [null, '(empty)'],
    [undefined, '(not present)'],
    [42, '42'],
    [{ a: 1 }, '{"a":1}'],
  ])('showValue(%j) is %j', (value, shown) => {
    expect(showValue(value)).toBe(shown);
  });
});
