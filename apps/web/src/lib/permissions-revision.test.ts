import { describe, expect, it } from 'vitest';

import { revisionPermissions } from './permissions';

// From the API contract's role table: systems engineers and admins write revisions, a revision is
// approved by someone other than its author, an approved revision never changes, auditors never write.
const author = { id: 7 };
const other = { id: 8 };

describe('revisionPermissions(user, revision)', () => {
  it('lets the author edit and submit a draft, and nobody approve it yet', () => {
    expect(revisionPermissions({ id: 7, role: 'systems_engineer' }, { status: 'draft', author })).toEqual({
      edit: true,
      submit: true,
      approve: false,
      retire: false,
      approveBlockedBy: null,
    });
  });

  it('lets another systems engineer approve a revision in review, but not its author', () => {
    expect(revisionPermissions({ id: 8, role: 'systems_engineer' }, { status: 'in_review', author }).approve).toBe(true);
    const own = revisionPermissions({ id: 7, role: 'systems_engineer' }, { status: 'in_review', author });
    expect(own.approve).toBe(false);
    expect(own.approveBlockedBy).toBe('own_revision');
  });

  it('offers no edit, submit or approve on an approved revision, only retire', () => {
    expect(revisionPermissions({ id: 8, role: 'admin' }, { status: 'approved', author: other })).toEqual({
      edit: false,
      submit: false,
      approve: false,
      retire: true,
      approveBlockedBy: null,
    });
  });

  it.each(['draft', 'in_review', 'approved', 'retired'] as const)('gives auditors and controls engineers nothing on a %s revision', (status) => {
    for (const role of ['auditor', 'controls_engineer'] as const) {
      const p = revisionPermissions({ id: 9, role }, { status, author });
      expect([p.edit, p.submit, p.approve, p.retire, p.approveBlockedBy]).toEqual([false, false, false, false, null]);
    }
  });
});
