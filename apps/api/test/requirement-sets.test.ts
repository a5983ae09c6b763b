import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { TestClient, signedIn } from './helpers/client.js';
import { startTestServer, stopTestServer } from './helpers/server.js';
import { approved, draft, inReview, newLine, newSet, uniqueName, type Team } from './helpers/workflow.js';

let url: string;
let team: Team;
beforeAll(async () => {
  url = (await startTestServer()).url;
  team = {
    admin: await signedIn(url, 'admin'),
    systems: await signedIn(url, 'systems_engineer'),
    controls: await signedIn(url, 'controls_engineer'),
    auditor: await signedIn(url, 'auditor'),
  };
});
afterAll(stopTestServer);

describe('POST /api/product-lines/:id/requirement-sets', () => {
  it('When a systems engineer adds a set, then 201 with no revisions, listed under the line, audited', async () => {
    const line = await newLine(team);
    const name = uniqueName('Step set');
    const r = await team.systems.post(`/api/product-lines/${line.id}/requirement-sets`, { name, purpose: 'Position steps' });
    expect(r.status).toBe(201);
    expect(r.body).toMatchObject({ name, purpose: 'Position steps', productLineId: line.id, revisions: [], currentRevisionId: null });
    const list = await team.auditor.get(`/api/product-lines/${line.id}/requirement-sets`);
    expect(list.body).toMatchObject({ total: 1, items: [{ id: r.body.id, revisionCount: 0, currentRevisionId: null }] });
    const audit = await team.admin.get(`/api/audit-events?entityType=requirement_set&entityId=${r.body.id}`);
    expect(audit.body.items[0].action).toBe('requirement_set.create');
  });

  it('When the name is empty, then 400 names it', async () => {
    const line = await newLine(team);
    const r = await team.systems.post(`/api/product-lines/${line.id}/requirement-sets`, { name: '  ', purpose: '' });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('name');
  });

  it('When the line already has a set of that name, then 409', async () => {
    const line = await newLine(team);
    const set = await newSet(team, line.id);
    const r = await team.admin.post(`/api/product-lines/${line.id}/requirement-sets`, { name: set.name, purpose: '' });
    expect(r.status).toBe(409);
  });

  it.each(['controls_engineer', 'auditor'] as const)('When a %s adds a set, then 403', async (role) => {
    const line = await newLine(team);
    const c = role === 'auditor' ? team.auditor : team.controls;
    expect((await c.post(`/api/product-lines/${line.id}/requirement-sets`, { name: uniqueName('No'), purpose: '' })).status).toBe(403);
    expect((await c.get(`/api/product-lines/${line.id}/requirement-sets`)).body.total).toBe(0);
  });

  it('When the line does not exist, then 404', async () => {
    expect((await team.systems.post('/api/product-lines/999999/requirement-sets', { name: 'x', purpose: '' })).status).toBe(404);
    expect((await team.systems.get('/api/product-lines/999999/requirement-sets')).status).toBe(404);
  });

  it('When signed out, then 401', async () => {
    expect((await new TestClient(url).get('/api/requirement-sets/1')).status).toBe(401);
  });
});

describe('GET /api/requirement-sets/:id', () => {
  it('When a set has revisions, then they come newest first with people named, and the approved one is current', async () => {
    const line = await newLine(team);
    const set = await newSet(team, line.id);
    const first = await approved(team, set.id, { maxOvershootPct: 10 });
    const second = await inReview(team, set.id, { maxOvershootPct: 8 });
    const third = await draft(team, set.id, { maxOvershootPct: 6 });
    const r = await team.controls.get(`/api/requirement-sets/${set.id}`);
    expect(r.status).toBe(200);
    expect(r.body.revisions.map((x: { id: number }) => x.id)).toEqual([third.id, second.id, first.id]);
    expect(r.body.revisions.map((x: { number: number }) => x.number)).toEqual([3, 2, 1]);
    expect(r.body.currentRevisionId).toBe(first.id);
    const rev1 = r.body.revisions[2];
    expect(rev1.author.email).toBe('systems@example.com');
    expect(rev1.approver.email).toBe('admin@example.com');
    for (const key of ['id', 'number', 'status', 'requirements', 'rationale', 'version', 'author', 'approver', 'submittedAt', 'approvedAt', 'retiredAt', 'sha256', 'approvalMeaning', 'impact']) {
      expect(rev1).toHaveProperty(key);
    }
  });

  it('When the set does not exist, then 404', async () => {
    expect((await team.auditor.get('/api/requirement-sets/999999')).status).toBe(404);
  });
});
