import { createHash } from 'node:crypto';
import { get as httpGet } from 'node:http';

import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { evaluate, regionBounds } from '@polecourt/spec';

import { normalizeError } from '../src/lib/error-middleware.js';
import { TestClient, signedIn } from './helpers/client.js';
import { startTestServer, stopTestServer, uniqueEmail } from './helpers/server.js';
import { approved, draft, inReview, newCandidate, newLine, newSet, thirdOrder, type Team } from './helpers/workflow.js';

let url: string;
let sequelize: Awaited<ReturnType<typeof startTestServer>>['sequelize'];
let team: Team;
beforeAll(async () => {
  const running = await startTestServer();
  url = running.url;
  sequelize = running.sequelize;
  team = {
    admin: await signedIn(url, 'admin'),
    systems: await signedIn(url, 'systems_engineer'),
    controls: await signedIn(url, 'controls_engineer'),
    auditor: await signedIn(url, 'auditor'),
  };
});
afterAll(stopTestServer);

const PASSWORD = 'polecourt-demo';
const OS10 = { maxOvershootPct: 10, maxSettlingTime: 1.5 };

async function freshSet() {
  const line = await newLine(team);
  const set = await newSet(team, line.id);
  return { line, set };
}

// An independent canonical form for the hash check: keys sorted, no spaces.
function sortedJson(o: Record<string, number>): string {
  return JSON.stringify(Object.fromEntries(Object.entries(o).sort(([a], [b]) => (a < b ? -1 : 1))));
}

describe('POST /api/requirement-sets/:id/revisions', () => {
  it('When a systems engineer writes a revision, then 201 with a draft numbered next in the set, version 1, and an audit event', async () => {
    const { set } = await freshSet();
    const first = await draft(team, set.id, OS10, 'first cut');
    const r = await team.systems.post(`/api/requirement-sets/${set.id}/revisions`, { requirements: { maxOvershootPct: 8 }, rationale: 'tighter' });
    expect(r.status).toBe(201);
    expect(first.number).toBe(1);
    expect(r.body).toMatchObject({ number: 2, status: 'draft', version: 1, requirements: { maxOvershootPct: 8 }, rationale: 'tighter', sha256: null, approver: null, requirementSetId: set.id });
    expect(r.body.author.email).toBe('systems@example.com');
    const audit = await team.admin.get(`/api/audit-events?entityType=revision&entityId=${r.body.id}`);
    expect(audit.body.items[0]).toMatchObject({ action: 'revision.create', before: null });
  });

  it('When a limit is out of range, then 400 names requirements.maxOvershootPct', async () => {
    const { set } = await freshSet();
    const r = await team.systems.post(`/api/requirement-sets/${set.id}/revisions`, { requirements: { maxOvershootPct: 150 }, rationale: '' });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty(['requirements.maxOvershootPct']);
  });

  it('When no limit is given, or an unknown one, then 400 names requirements', async () => {
    const { set } = await freshSet();
    const none = await team.systems.post(`/api/requirement-sets/${set.id}/revisions`, { requirements: { settlingBandPct: 2 } });
    expect(none.status).toBe(400);
    expect(Object.keys(none.body.error.fields)[0]).toMatch(/^requirements/);
    const unknown = await team.systems.post(`/api/requirement-sets/${set.id}/revisions`, { requirements: { maxOvershootPct: 5, maxJerk: 3 } });
    expect(unknown.status).toBe(400);
    expect(Object.keys(unknown.body.error.fields)[0]).toMatch(/^requirements/);
  });

  it.each(['controls_engineer', 'auditor'] as const)('When a %s writes a revision, then 403 and the set has none', async (role) => {
    const { set } = await freshSet();
    const c = role === 'auditor' ? team.auditor : team.controls;
    expect((await c.post(`/api/requirement-sets/${set.id}/revisions`, { requirements: OS10 })).status).toBe(403);
    expect((await c.get(`/api/requirement-sets/${set.id}`)).body.revisions).toHaveLength(0);
  });

  it('When the set does not exist, then 404; signed out, 401', async () => {
    expect((await team.systems.post('/api/requirement-sets/999999/revisions', { requirements: OS10 })).status).toBe(404);
    expect((await new TestClient(url).post('/api/requirement-sets/1/revisions', { requirements: OS10 })).status).toBe(401);
  });
});

describe('GET /api/revisions/:id', () => {
  it('When it exists, then any role reads it; when not, 404', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, OS10);
    const r = await team.auditor.get(`/api/revisions/${d.id}`);
    expect(r.status).toBe(200);
    expect(r.body).toEqual(d);
    expect((await team.auditor.get('/api/revisions/999999')).status).toBe(404);
  });
});

describe('PATCH /api/revisions/:id', () => {
  it('When the draft is edited at its current version, then the change lands, the version goes up and the audit has before and after', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, OS10);
    const r = await team.systems.patch(`/api/revisions/${d.id}`, { requirements: { maxOvershootPct: 7 }, version: d.version });
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ requirements: { maxOvershootPct: 7 }, version: d.version + 1, rationale: d.rationale });
    const audit = await team.admin.get(`/api/audit-events?entityType=revision&entityId=${d.id}&action=revision.update`);
    expect(audit.body.items[0].before.requirements).toEqual(OS10);
    expect(audit.body.items[0].after.requirements).toEqual({ maxOvershootPct: 7 });
  });

  it('When two people edit the same version, then the second gets 409 stale_version saying someone else saved first, and the first edit stays', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, OS10);
    expect((await team.systems.patch(`/api/revisions/${d.id}`, { rationale: 'first', version: d.version })).status).toBe(200);
    const late = await team.admin.patch(`/api/revisions/${d.id}`, { rationale: 'second', version: d.version });
    expect(late.status).toBe(409);
    expect(late.body.error.code).toBe('stale_version');
    expect(late.body.error.message).toMatch(/someone else saved/i);
    expect((await team.auditor.get(`/api/revisions/${d.id}`)).body.rationale).toBe('first');
  });

  it('When the version is missing or a limit is bad, then 400 names the field', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, OS10);
    const noVersion = await team.systems.patch(`/api/revisions/${d.id}`, { rationale: 'x' });
    expect(noVersion.status).toBe(400);
    expect(noVersion.body.error.fields).toHaveProperty('version');
    const bad = await team.systems.patch(`/api/revisions/${d.id}`, { requirements: { minDampingRatio: 1.5 }, version: d.version });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty(['requirements.minDampingRatio']);
  });

  it('When the revision is approved, then 409 revision_frozen and nothing changes', async () => {
    const { set } = await freshSet();
    const a = await approved(team, set.id, OS10);
    const r = await team.systems.patch(`/api/revisions/${a.id}`, { rationale: 'sneaky', version: a.version });
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe('revision_frozen');
    expect((await team.auditor.get(`/api/revisions/${a.id}`)).body).toEqual(a);
  });

  it('When the revision is in review, then 409 not_draft', async () => {
    const { set } = await freshSet();
    const rev = await inReview(team, set.id, OS10);
    const r = await team.systems.patch(`/api/revisions/${rev.id}`, { rationale: 'x', version: rev.version });
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe('not_draft');
  });

  it.each(['controls_engineer', 'auditor'] as const)('When a %s edits a draft, then 403 and it stays', async (role) => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, OS10);
    const c = role === 'auditor' ? team.auditor : team.controls;
    expect((await c.patch(`/api/revisions/${d.id}`, { rationale: 'x', version: d.version })).status).toBe(403);
    expect((await c.get(`/api/revisions/${d.id}`)).body.version).toBe(d.version);
  });

  it('When the revision does not exist, then 404', async () => {
    expect((await team.systems.patch('/api/revisions/999999', { rationale: 'x', version: 1 })).status).toBe(404);
  });
});

describe('POST /api/revisions/:id/submit', () => {
  it('When the author submits a draft, then it is in review with submittedAt, and a second submit is 409', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, OS10);
    const r = await team.systems.post(`/api/revisions/${d.id}/submit`);
    expect(r.status).toBe(200);
    expect(r.body.status).toBe('in_review');
    expect(Date.parse(r.body.submittedAt)).not.toBeNaN();
    expect((await team.systems.post(`/api/revisions/${d.id}/submit`)).status).toBe(409);
  });

  it('When another systems engineer submits someone else’s draft, then 403; an administrator may', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, OS10);
    const email = uniqueEmail('second.systems');
    expect((await team.admin.post('/api/users', { email, name: 'Second Systems', role: 'systems_engineer', password: 'a-long-test-password' })).status).toBe(201);
    const other = new TestClient(url);
    expect((await other.login(email, 'a-long-test-password')).status).toBe(200);
    expect((await other.post(`/api/revisions/${d.id}/submit`)).status).toBe(403);
    expect((await team.auditor.get(`/api/revisions/${d.id}`)).body.status).toBe('draft');
    expect((await team.admin.post(`/api/revisions/${d.id}/submit`)).status).toBe(200);
  });

  it.each(['controls_engineer', 'auditor'] as const)('When a %s submits, then 403', async (role) => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, OS10);
    const c = role === 'auditor' ? team.auditor : team.controls;
    expect((await c.post(`/api/revisions/${d.id}/submit`)).status).toBe(403);
  });

  it('When the revision does not exist, then 404', async () => {
    expect((await team.systems.post('/api/revisions/999999/submit')).status).toBe(404);
  });
});

describe('POST /api/revisions/:id/approve', () => {
  it('When someone other than the author approves with their password, then it is approved with its content hash, approver, time, meaning and impact, and the previous approved revision is retired', async () => {
    const { line, set } = await freshSet();
    const c = await newCandidate(team, line.id, thirdOrder(-2, 3.464, -200)); // zeta = 0.5: about 16 % overshoot
    const first = await approved(team, set.id, { maxOvershootPct: 20 });
    const second = await inReview(team, set.id, { maxOvershootPct: 5, maxSettlingTime: 3 });
    const r = await team.admin.post(`/api/revisions/${second.id}/approve`, { password: PASSWORD, impactAcknowledged: true });
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ status: 'approved', approvalMeaning: 'approved', version: second.version + 1 });
    expect(r.body.approver.email).toBe('admin@example.com');
    expect(r.body.approvedAt).toMatch(/Z$/);
    expect(r.body.sha256).toBe(createHash('sha256').update(sortedJson({ maxOvershootPct: 5, maxSettlingTime: 3 })).digest('hex'));
    expect(r.body.impact).toMatchObject({ baselineRevisionId: first.id, total: 1 });
    const expectedNow = evaluate(c.design, { maxOvershootPct: 5, maxSettlingTime: 3 }).verdict;
    const expectedBefore = evaluate(c.design, { maxOvershootPct: 20 }).verdict;
    expect(r.body.impact.changed).toEqual(expectedNow === expectedBefore ? [] : [{ candidateId: c.id, name: c.name, from: expectedBefore, to: expectedNow }]);
    expect(expectedBefore).not.toBe(expectedNow); // the case is built so the verdict changes

    const old = await team.auditor.get(`/api/revisions/${first.id}`);
    expect(old.body.status).toBe('retired');
    expect(Date.parse(old.body.retiredAt)).not.toBeNaN();
    const setNow = await team.auditor.get(`/api/requirement-sets/${set.id}`);
    expect(setNow.body.currentRevisionId).toBe(second.id);
    const audit = await team.admin.get(`/api/audit-events?productLineId=${line.id}&entityType=revision`);
    const actions = audit.body.items.map((e: { action: string; entityId: string }) => `${e.action}:${e.entityId}`);
    expect(actions).toEqual(expect.arrayContaining([`revision.approve:${second.id}`, `revision.retire:${first.id}`]));
  });

  it('When the password is wrong, then 400 names password (not 401), and the revision stays in review', async () => {
    const { set } = await freshSet();
    const rev = await inReview(team, set.id, OS10);
    const r = await team.admin.post(`/api/revisions/${rev.id}/approve`, { password: 'not-the-password', impactAcknowledged: true });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('password');
    expect((await team.admin.get('/api/auth/me')).status).toBe(200);
    expect((await team.auditor.get(`/api/revisions/${rev.id}`)).body.status).toBe('in_review');
  });

  it('When the impact is not acknowledged, then 400 names impactAcknowledged', async () => {
    const { set } = await freshSet();
    const rev = await inReview(team, set.id, OS10);
    const r = await team.admin.post(`/api/revisions/${rev.id}/approve`, { password: PASSWORD });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('impactAcknowledged');
  });

  it('When the author approves their own revision, then 403 self_approval and it stays in review', async () => {
    const { set } = await freshSet();
    const rev = await inReview(team, set.id, OS10);
    const r = await team.systems.post(`/api/revisions/${rev.id}/approve`, { password: PASSWORD, impactAcknowledged: true });
    expect(r.status).toBe(403);
    expect(r.body.error.code).toBe('self_approval');
    expect((await team.auditor.get(`/api/revisions/${rev.id}`)).body.status).toBe('in_review');
  });

  it.each(['controls_engineer', 'auditor'] as const)('When a %s approves, then 403', async (role) => {
    const { set } = await freshSet();
    const rev = await inReview(team, set.id, OS10);
    const c = role === 'auditor' ? team.auditor : team.controls;
    expect((await c.post(`/api/revisions/${rev.id}/approve`, { password: PASSWORD, impactAcknowledged: true })).status).toBe(403);
  });

  it('When the revision is still a draft, then 409; when already approved, 409 revision_frozen', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, OS10);
    const r = await team.admin.post(`/api/revisions/${d.id}/approve`, { password: PASSWORD, impactAcknowledged: true });
    expect(r.status).toBe(409);
    const a = await approved(team, set.id, OS10);
    const again = await team.admin.post(`/api/revisions/${a.id}/approve`, { password: PASSWORD, impactAcknowledged: true });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('revision_frozen');
  });

  it('When two revisions of one set are approved at the same moment, then both calls finish and exactly one revision is approved', async () => {
    const { set } = await freshSet();
    const a = await inReview(team, set.id, { maxOvershootPct: 9 });
    const b = await inReview(team, set.id, { maxOvershootPct: 8 });
    const [ra, rb] = await Promise.all([
      team.admin.post(`/api/revisions/${a.id}/approve`, { password: PASSWORD, impactAcknowledged: true }),
      team.admin.post(`/api/revisions/${b.id}/approve`, { password: PASSWORD, impactAcknowledged: true }),
    ]);
    expect([ra.status, rb.status]).toEqual([200, 200]);
    const revisions = (await team.auditor.get(`/api/requirement-sets/${set.id}`)).body.revisions as { status: string }[];
    expect(revisions.filter((r) => r.status === 'approved')).toHaveLength(1);
    expect(revisions.filter((r) => r.status === 'retired')).toHaveLength(1);
  });

  it('When the revision does not exist, then 404', async () => {
    expect((await team.admin.post('/api/revisions/999999/approve', { password: PASSWORD, impactAcknowledged: true })).status).toBe(404);
  });
});

describe('POST /api/revisions/:id/retire', () => {
  it('When an approved revision is retired, then it says retired with a time and the set has no current revision', async () => {
    const { set } = await freshSet();
    const a = await approved(team, set.id, OS10);
    const r = await team.systems.post(`/api/revisions/${a.id}/retire`);
    expect(r.status).toBe(200);
    expect(r.body.status).toBe('retired');
    expect(r.body.sha256).toBe(a.sha256);
    expect((await team.auditor.get(`/api/requirement-sets/${set.id}`)).body.currentRevisionId).toBeNull();
    expect((await team.systems.post(`/api/revisions/${a.id}/retire`)).status).toBe(409);
  });

  it('When the revision is a draft, then 409', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, OS10);
    expect((await team.systems.post(`/api/revisions/${d.id}/retire`)).status).toBe(409);
  });

  it.each(['controls_engineer', 'auditor'] as const)('When a %s retires, then 403 and it stays approved', async (role) => {
    const { set } = await freshSet();
    const a = await approved(team, set.id, OS10);
    const c = role === 'auditor' ? team.auditor : team.controls;
    expect((await c.post(`/api/revisions/${a.id}/retire`)).status).toBe(403);
    expect((await c.get(`/api/revisions/${a.id}`)).body.status).toBe('approved');
  });

  it('When the revision does not exist, then 404', async () => {
    expect((await team.systems.post('/api/revisions/999999/retire')).status).toBe(404);
  });
});

describe('the database freeze on approved revisions', () => {
  async function sqlError(statement: string, id: number): Promise<unknown> {
    try {
      await sequelize.query(statement, { replacements: [id] });
      return null;
    } catch (err) {
      return err;
    }
  }

  it('When SQL changes an approved revision’s content, then the trigger refuses with SQLSTATE 45000 and the API maps that to 409 revision_frozen', async () => {
    const { set } = await freshSet();
    const a = await approved(team, set.id, OS10);
    const err = await sqlError(`UPDATE revisions SET requirements_json = '{"maxOvershootPct":50}' WHERE id = ?`, a.id);
    expect((err as { parent?: { sqlState?: string } }).parent?.sqlState).toBe('45000');
    const mapped = normalizeError(err);
    expect([mapped.status, mapped.code]).toEqual([409, 'revision_frozen']);
    expect((await team.auditor.get(`/api/revisions/${a.id}`)).body.requirements).toEqual(OS10);
  });

  it('When SQL moves an approved revision back to draft, rewrites its hash or deletes it, then each is refused', async () => {
    const { set } = await freshSet();
    const a = await approved(team, set.id, OS10);
    for (const statement of [
      `UPDATE revisions SET status = 'draft' WHERE id = ?`,
      `UPDATE revisions SET sha256 = REPEAT('0', 64) WHERE id = ?`,
      `UPDATE revisions SET rationale = 'edited' WHERE id = ?`,
      `DELETE FROM revisions WHERE id = ?`,
    ]) {
      const err = await sqlError(statement, a.id);
      expect((err as { parent?: { sqlState?: string } } | null)?.parent?.sqlState, statement).toBe('45000');
    }
    expect((await team.auditor.get(`/api/revisions/${a.id}`)).body).toEqual(a);
  });

  it('When SQL retires an approved revision, then that one move is allowed; after it, the retired row is frozen too', async () => {
    const { set } = await freshSet();
    const a = await approved(team, set.id, OS10);
    expect(await sqlError(`UPDATE revisions SET status = 'retired', retired_at = NOW(3) WHERE id = ?`, a.id)).toBeNull();
    for (const statement of [
      `UPDATE revisions SET status = 'approved' WHERE id = ?`,
      `UPDATE revisions SET retired_at = NULL WHERE id = ?`,
      `DELETE FROM revisions WHERE id = ?`,
    ]) {
      const err = await sqlError(statement, a.id);
      expect((err as { parent?: { sqlState?: string } } | null)?.parent?.sqlState, statement).toBe('45000');
    }
  });

  it('When SQL edits a draft, then the trigger lets it through (only approved and retired rows are frozen)', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, OS10);
    expect(await sqlError(`UPDATE revisions SET rationale = 'edited in SQL' WHERE id = ?`, d.id)).toBeNull();
    expect((await team.auditor.get(`/api/revisions/${d.id}`)).body.rationale).toBe('edited in SQL');
  });
});

describe('GET /api/revisions/:id/diff', () => {
  it('When compared with the approved revision by default, then each limit says added, removed, tightened, loosened or same', async () => {
    const { set } = await freshSet();
    const base = await approved(team, set.id, { maxOvershootPct: 10, maxSettlingTime: 1.5, minDampingRatio: 0.5, maxPeakTime: 0.8 });
    const d = await draft(team, set.id, { maxOvershootPct: 8, maxSettlingTime: 2, minDampingRatio: 0.6, maxRiseTime: 0.3 });
    const r = await team.auditor.get(`/api/revisions/${d.id}/diff`);
    expect(r.status).toBe(200);
    expect(r.body.againstRevisionId).toBe(base.id);
    const byField = Object.fromEntries(r.body.items.map((x: { field: string }) => [x.field, x]));
    expect(byField.maxOvershootPct).toEqual({ field: 'maxOvershootPct', before: 10, after: 8, change: 'tightened' });
    expect(byField.maxSettlingTime.change).toBe('loosened');
    expect(byField.minDampingRatio.change).toBe('tightened'); // a higher damping floor is stricter
    expect(byField.maxPeakTime).toEqual({ field: 'maxPeakTime', before: 0.8, after: null, change: 'removed' });
    expect(byField.maxRiseTime).toEqual({ field: 'maxRiseTime', before: null, after: 0.3, change: 'added' });
  });

  it('When ?against names another revision, then the diff is against it; the same content is all same', async () => {
    const { set } = await freshSet();
    const a = await draft(team, set.id, OS10);
    const b = await draft(team, set.id, OS10);
    const r = await team.auditor.get(`/api/revisions/${b.id}/diff?against=${a.id}`);
    expect(r.body.againstRevisionId).toBe(a.id);
    expect(r.body.items.map((x: { change: string }) => x.change)).toEqual(['same', 'same']);
  });

  it('When the set has no approved revision, then every limit is added against nothing', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, OS10);
    const r = await team.auditor.get(`/api/revisions/${d.id}/diff`);
    expect(r.body.againstRevisionId).toBeNull();
    expect(r.body.items.every((x: { change: string }) => x.change === 'added')).toBe(true);
  });

  it('When against is not a number, then 400; when it names nothing, 404', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, OS10);
    const bad = await team.auditor.get(`/api/revisions/${d.id}/diff?against=abc`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('against');
    expect((await team.auditor.get(`/api/revisions/${d.id}/diff?against=999999`)).status).toBe(404);
    expect((await team.auditor.get('/api/revisions/999999/diff')).status).toBe(404);
  });
});

describe('GET /api/revisions/:id/region', () => {
  const LIMITS = { maxOvershootPct: 10, maxSettlingTime: 1.2, maxPeakTime: 0.8, maxNaturalFrequency: 20 };

  it('When asked without a window, then the bounds are the engine’s and the polygons fill a default window around them', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, LIMITS);
    const r = await team.controls.get(`/api/revisions/${d.id}/region`);
    expect(r.status).toBe(200);
    expect(r.body.bounds).toEqual(JSON.parse(JSON.stringify(regionBounds(LIMITS))));
    const v = r.body.viewport;
    expect(v.reMin).toBeLessThanOrEqual(-LIMITS.maxNaturalFrequency);
    expect(v.imMax).toBeGreaterThanOrEqual(LIMITS.maxNaturalFrequency);
    expect(v.reMax).toBeGreaterThan(0);
    expect(r.body.polygons.viewport).toEqual(v);
    expect(r.body.polygons.polygons.length).toBeGreaterThan(0);
    // Every polygon point lies in the left half-plane inside the ceiling circle.
    for (const poly of r.body.polygons.polygons) {
      for (const p of poly.points) {
        expect(p.re).toBeLessThanOrEqual(1e-9);
        expect(Math.hypot(p.re, p.im)).toBeLessThanOrEqual(LIMITS.maxNaturalFrequency * (1 + 1e-9));
      }
    }
  });

  it('When a window is given, then the polygons are clipped to it', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, LIMITS);
    const r = await team.controls.get(`/api/revisions/${d.id}/region?reMin=-10&reMax=1&imMin=-5&imMax=5`);
    expect(r.status).toBe(200);
    expect(r.body.viewport).toEqual({ reMin: -10, reMax: 1, imMin: -5, imMax: 5 });
    for (const poly of r.body.polygons.polygons) {
      for (const p of poly.points) {
        expect(p.re).toBeGreaterThanOrEqual(-10 - 1e-9);
        expect(Math.abs(p.im)).toBeLessThanOrEqual(5 + 1e-9);
      }
    }
  });

  it('When the window is empty or not a number, then 400 names the field', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, LIMITS);
    const empty = await team.controls.get(`/api/revisions/${d.id}/region?reMin=5&reMax=1`);
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields).toHaveProperty('reMin');
    const nan = await team.controls.get(`/api/revisions/${d.id}/region?imMax=lots`);
    expect(nan.status).toBe(400);
    expect(nan.body.error.fields).toHaveProperty('imMax');
    expect((await team.controls.get('/api/revisions/999999/region')).status).toBe(404);
  });

  it('When a draft is edited, then its region follows the new limits (regions are kept per limits, never stale)', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, LIMITS);
    const before = await team.controls.get(`/api/revisions/${d.id}/region`);
    expect(before.body.bounds.maxNaturalFrequency).toBe(20);
    const edited = await team.systems.patch(`/api/revisions/${d.id}`, { requirements: { ...LIMITS, maxNaturalFrequency: 40 }, version: d.version });
    expect(edited.status).toBe(200);
    const after = await team.controls.get(`/api/revisions/${d.id}/region`);
    expect(after.body.bounds).toEqual(JSON.parse(JSON.stringify(regionBounds({ ...LIMITS, maxNaturalFrequency: 40 }))));
  });

  it('When asked again with the ETag it gave, then 304 without a body; with another ETag, the full region', async () => {
    const { set } = await freshSet();
    const d = await draft(team, set.id, LIMITS);
    const first = await team.controls.get(`/api/revisions/${d.id}/region`);
    const etag = first.headers.get('etag');
    expect(etag).toMatch(/^W\/"/);
    // node:http, not fetch: fetch adds Cache-Control: no-cache to a conditional request, which asks for the full body.
    const again = await new Promise<{ status: number; body: string }>((resolve, reject) => {
      const req = httpGet(`${team.controls.baseUrl}/api/revisions/${d.id}/region`, { headers: { cookie: team.controls.cookieHeader, 'if-none-match': etag! } }, (res) => {
        let body = '';
        res.on('data', (chunk: Buffer) => (body += chunk.toString()));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, body }));
      });
      req.on('error', reject);
    });
    expect(again.status).toBe(304);
    expect(again.body).toBe('');
    const other = await team.controls.request('GET', `/api/revisions/${d.id}/region`, undefined, { headers: { 'if-none-match': 'W/"0-other"' } });
    expect(other.status).toBe(200);
    expect(other.body).toEqual(first.body);
  });
});

describe('GET /api/revisions/:id/impact', () => {
  it('When a draft tightens the overshoot limit, then every candidate is assessed both ways, the ones that change verdict come first, each with its checks', async () => {
    const { line, set } = await freshSet();
    // zeta = 0.5 (about 16 % overshoot) and zeta = 0.8 (about 1.5 %), second-order
    // overshoot formula exp(-zeta*pi/sqrt(1-zeta^2)); the real pole at -300 is far away.
    const calm = await newCandidate(team, line.id, thirdOrder(-4, 3, -300), 'A calm loop');
    const lively = await newCandidate(team, line.id, thirdOrder(-2, 3.4641, -300), 'B lively loop');
    const base = await approved(team, set.id, { maxOvershootPct: 20 });
    const proposal = await draft(team, set.id, { maxOvershootPct: 5 });
    const r = await team.auditor.get(`/api/revisions/${proposal.id}/impact`);
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ revisionId: proposal.id, baselineRevisionId: base.id, total: 2, changedCount: 1 });
    expect(r.body.items.map((x: { candidateId: number }) => x.candidateId)).toEqual([lively.id, calm.id]);
    for (const [row, c] of [[r.body.items[0], lively], [r.body.items[1], calm]]) {
      const now = evaluate(c.design, { maxOvershootPct: 5 });
      const before = evaluate(c.design, { maxOvershootPct: 20 });
      expect(row.proposed).toEqual({ verdict: now.verdict, checks: JSON.parse(JSON.stringify(now.checks)) });
      expect(row.current).toEqual({ verdict: before.verdict, checks: JSON.parse(JSON.stringify(before.checks)) });
      expect(row.changed).toBe(now.verdict !== before.verdict);
    }
  });

  it('When the revision is already approved, then it is compared with the revision it replaced', async () => {
    const { line, set } = await freshSet();
    await newCandidate(team, line.id, thirdOrder(-2, 3.4641, -300));
    const base = await approved(team, set.id, { maxOvershootPct: 20 });
    const next = await approved(team, set.id, { maxOvershootPct: 5 });
    const r = await team.auditor.get(`/api/revisions/${next.id}/impact`);
    expect(r.body).toMatchObject({ baselineRevisionId: base.id, changedCount: next.impact.changed.length });
    const diff = await team.auditor.get(`/api/revisions/${next.id}/diff`);
    expect(diff.body.againstRevisionId).toBe(base.id);
    expect(diff.body.items).toEqual([{ field: 'maxOvershootPct', before: 20, after: 5, change: 'tightened' }]);
  });

  it('When the set has no approved revision, then current is null for every row', async () => {
    const { line, set } = await freshSet();
    await newCandidate(team, line.id, thirdOrder(-4, 3, -300));
    const d = await draft(team, set.id, OS10);
    const r = await team.auditor.get(`/api/revisions/${d.id}/impact`);
    expect(r.body.baselineRevisionId).toBeNull();
    expect(r.body.items[0].current).toBeNull();
  });

  it('When the revision does not exist, then 404', async () => {
    expect((await team.auditor.get('/api/revisions/999999/impact')).status).toBe(404);
  });
});
