// The one place that says which role may see and do what in the web client.
// Mirrors the role table of the HTTP API contract; the server still enforces every rule,
// this only keeps screens from offering what the signed-in person's role may not use.
import type { Role } from '@polecourt/contracts';

export type Area = 'overview' | 'product_lines' | 'candidates' | 'reports' | 'verify_report' | 'audit_trail' | 'users' | 'outbox' | 'settings';

/** none: not shown; read: shown, nothing can be changed; write: shown with its editing controls. */
export type Access = 'none' | 'read' | 'write';

export interface AreaInfo {
  area: Area;
  path: string;
  label: string;
  summary: string;
}

/** Navigation order. Requirement sets and their revisions live inside a product line, so they share its area. */
export const AREAS: readonly AreaInfo[] = [
  { area: 'overview', path: '/', label: 'Overview', summary: 'What your role can use in Polecourt.' },
  {
    area: 'product_lines',
    path: '/product-lines',
    label: 'Product lines',
    summary: 'Product lines and their requirement sets: the transient limits each product family must meet.',
  },
  {
    area: 'candidates',
    path: '/candidates',
    label: 'Candidates',
    summary: 'Closed-loop models submitted for a product line, and their assessments against a revision.',
  },
  {
    area: 'reports',
    path: '/reports',
    label: 'Reports',
    summary: 'Signed compliance reports: issue one for an assessment, download it, verify a report.',
  },
  {
    area: 'verify_report',
    path: '/reports/verify',
    label: 'Verify a report',
    summary: 'Check a compliance report PDF: intact signature, issued by Polecourt, numbers recomputed.',
  },
  {
    area: 'audit_trail',
    path: '/audit-trail',
    label: 'Audit trail',
    summary: 'Every change recorded with who, when, what, before and after, and a check that the chain is intact.',
  },
  { area: 'users', path: '/users', label: 'Users', summary: 'Accounts, roles and who may sign in.' },
  { area: 'outbox', path: '/outbox', label: 'Outbox', summary: 'E-mail Polecourt has sent through its local mail service.' },
  { area: 'settings', path: '/settings/tokens', label: 'Settings', summary: 'Your API tokens for pipelines, and your password.' },
];

const ACCESS: Record<Role, Record<Area, Access>> = {
  admin: {
    overview: 'read',
    product_lines: 'write',
    candidates: 'write',
    reports: 'write',
    verify_report: 'read', // changes nothing, so every signed-in role may check a report
    audit_trail: 'read', // the trail is written by the server only, never by a person
    users: 'write',
    outbox: 'read', // messages are read, never written, here
    settings: 'write', // everyone manages their own tokens and password
  },
  systems_engineer: {
    overview: 'read',
    product_lines: 'write',
    candidates: 'none',
    reports: 'none',
    verify_report: 'read', // changes nothing, so every signed-in role may check a report
    audit_trail: 'none',
    users: 'none',
    outbox: 'none',
    settings: 'write', // everyone manages their own tokens and password
  },
  controls_engineer: {
    overview: 'read',
    product_lines: 'read', // to pick the revision a candidate is assessed against
    candidates: 'write',
    reports: 'write',
    verify_report: 'read', // changes nothing, so every signed-in role may check a report
    audit_trail: 'none',
    users: 'none',
    outbox: 'none',
    settings: 'write', // everyone manages their own tokens and password
  },
  auditor: {
    overview: 'read',
    product_lines: 'read',
    candidates: 'read',
    reports: 'read',
    verify_report: 'read', // changes nothing, so every signed-in role may check a report
    audit_trail: 'read',
    users: 'none',
    outbox: 'none',
    settings: 'write', // everyone manages their own tokens and password
  },
};

/** Single actions that are narrower than "write access to the area". */
export type Action =
  | 'manage_users'
  | 'edit_requirement_sets'
  | 'approve_revision'
  | 'submit_candidate'
  | 'run_assessment'
  | 'sign_report'
  | 'verify_report'
  | 'verify_audit_trail';

const ACTIONS: Record<Action, readonly Role[]> = {
  manage_users: ['admin'],
  edit_requirement_sets: ['admin', 'systems_engineer'],
  // The server also refuses an approval by the revision's own author.
  approve_revision: ['admin', 'systems_engineer'],
  submit_candidate: ['admin', 'controls_engineer'],
  run_assessment: ['admin', 'controls_engineer'],
  sign_report: ['admin', 'controls_engineer'],
  // Verifying a downloaded report changes nothing, so the read-only auditor may do it.
  verify_report: ['admin', 'systems_engineer', 'controls_engineer', 'auditor'],
  verify_audit_trail: ['admin', 'auditor'],
};

export function accessTo(role: Role, area: Area): Access {
  return ACCESS[role][area];
}

export function canView(role: Role, area: Area): boolean {
  return accessTo(role, area) !== 'none';
}

export function canWrite(role: Role, area: Area): boolean {
  return accessTo(role, area) === 'write';
}

export function can(role: Role, action: Action): boolean {
  return ACTIONS[action].includes(role);
}

export function navItemsFor(role: Role): AreaInfo[] {
  return AREAS.filter((info) => canView(role, info.area));
}

export function areaInfo(area: Area): AreaInfo {
  const info = AREAS.find((a) => a.area === area);
  if (!info) throw new Error(`Unknown area ${area}`);
  return info;
}

/** What the signed-in person may do to one revision, from its state and who wrote it (the server checks the same). */
export interface RevisionPermissions {
  edit: boolean;
  submit: boolean;
  approve: boolean;
  retire: boolean;
  /** Why approval is not offered to someone who may otherwise approve (e.g. their own revision). */
  approveBlockedBy: 'own_revision' | null;
}

export function revisionPermissions(
  user: { id: number; role: Role },
  revision: { status: 'draft' | 'in_review' | 'approved' | 'retired'; author: { id: number } },
): RevisionPermissions {
  const writer = can(user.role, 'edit_requirement_sets');
  const own = revision.author.id === user.id;
  const mayApprove = can(user.role, 'approve_revision');
  return {
    // Approved and retired revisions never change again; drafts are edited by any writer.
    edit: writer && revision.status === 'draft',
    // The author submits their own draft; an administrator may do it for them.
    submit: writer && revision.status === 'draft' && (own || user.role === 'admin'),
    // Four eyes: never the author.
    approve: mayApprove && revision.status === 'in_review' && !own,
    retire: writer && revision.status === 'approved',
    approveBlockedBy: mayApprove && revision.status === 'in_review' && own ? 'own_revision' : null,
  };
}
