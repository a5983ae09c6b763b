import { ROLES, type Role } from '@polecourt/contracts';
import { describe, expect, it } from 'vitest';

import { AREAS, type Action, type Area, accessTo, areaInfo, can, canView, canWrite, navItemsFor } from './permissions';

// Expected navigation per role, from the role table of the API contract:
// admin may do everything; systems engineers own product lines and requirement sets; controls
// engineers own candidates, assessments and reports and read product lines; auditors read everything.
const expectedNav: Record<Role, string[]> = {
  admin: ['Overview', 'Product lines', 'Candidates', 'Reports', 'Verify a report', 'Audit trail', 'Users', 'Outbox', 'Settings'],
  systems_engineer: ['Overview', 'Product lines', 'Verify a report', 'Settings'],
  controls_engineer: ['Overview', 'Product lines', 'Candidates', 'Reports', 'Verify a report', 'Settings'],
  auditor: ['Overview', 'Product lines', 'Candidates', 'Reports', 'Verify a report', 'Audit trail', 'Settings'],
};

describe('navItemsFor(role)', () => {
  it.each(ROLES.map((role) => [role, expectedNav[role]] as const))('navItemsFor(%s) lists exactly %j', (role, labels) => {
    expect(navItemsFor(role).map((item) => item.label)).toEqual(labels);
  });

  it('shows Settings (own API tokens and password) to every role', () => {
    for (const role of ROLES) expect(navItemsFor(role).map((item) => item.path)).toContain('/settings/tokens');
  });

  it('shows Users to the admin only', () => {
    expect(ROLES.filter((role) => navItemsFor(role).some((item) => item.area === 'users'))).toEqual(['admin']);
  });
});

describe('access levels', () => {
  it('gives the auditor read access and never write access', () => {
    // Settings is the auditor's own account (API tokens that can only read, the password), not the product's records.
    for (const { area } of AREAS) if (area !== 'settings') expect(canWrite('auditor', area)).toBe(false);
    expect(AREAS.filter(({ area }) => canView('auditor', area)).map((a) => a.area)).toEqual([
      'overview',
      'product_lines',
      'candidates',
      'reports',
      'verify_report',
      'audit_trail',
      'settings',
    ]);
  });

  it('lets nobody write the audit trail, not even the admin', () => {
    for (const role of ROLES) expect(canWrite(role, 'audit_trail')).toBe(false);
  });

  it('lets systems engineers write product lines but not candidates or reports', () => {
    expect(accessTo('systems_engineer', 'product_lines')).toBe('write');
    expect(accessTo('systems_engineer', 'candidates')).toBe('none');
    expect(accessTo('systems_engineer', 'reports')).toBe('none');
  });

  it('lets controls engineers read product lines and write candidates and reports', () => {
    expect(accessTo('controls_engineer', 'product_lines')).toBe('read');
    expect(accessTo('controls_engineer', 'candidates')).toBe('write');
    expect(accessTo('controls_engineer', 'reports')).toBe('write');
  });

  it('gives every role the overview', () => {
    for (const role of ROLES) expect(canView(role, 'overview')).toBe(true);
  });

  it('lets every role verify a report, since that changes nothing', () => {
    for (const role of ROLES) {
      expect(accessTo(role, 'verify_report')).toBe('read');
      expect(can(role, 'verify_report')).toBe(true);
    }
  });
});

// Each action belongs to an area; a role allowed the action must see that area, and a role that
// changes stored data must have write access there.
const actionArea: Record<Action, { area: Area; writes: boolean }> = {
  manage_users: { area: 'users', writes: true },
  edit_requirement_sets: { area: 'product_lines', writes: true },
  approve_revision: { area: 'product_lines', writes: true },
  submit_candidate: { area: 'candidates', writes: true },
  run_assessment: { area: 'candidates', writes: true },
  sign_report: { area: 'reports', writes: true },
  verify_report: { area: 'verify_report', writes: false },
  verify_audit_trail: { area: 'audit_trail', writes: false },
};

describe('can(role, action)', () => {
  it.each(Object.entries(actionArea))('%s is only allowed where its area allows it', (action, { area, writes }) => {
    for (const role of ROLES) {
      if (!can(role, action as Action)) continue;
      expect(canView(role, area)).toBe(true);
      if (writes) expect(canWrite(role, area)).toBe(true);
    }
  });

  it('allows the auditor only the checks that change nothing', () => {
    const allowed = (Object.keys(actionArea) as Action[]).filter((action) => can('auditor', action));
    expect(allowed).toEqual(['verify_report', 'verify_audit_trail']);
  });

  it('keeps user management to the admin', () => {
    expect(ROLES.filter((role) => can(role, 'manage_users'))).toEqual(['admin']);
  });
});

describe('AREAS', () => {
  it('has one distinct path per area and areaInfo finds each', () => {
    expect(new Set(AREAS.map((a) => a.path)).size).toBe(AREAS.length);
    for (const info of AREAS) expect(areaInfo(info.area)).toBe(info);
  });
});
