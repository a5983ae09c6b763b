import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { ENGINE_VERSION, evaluate } from '@polecourt/spec';

import { TestClient, signedIn } from './helpers/client.js';
import { startTestServer, stopTestServer } from './helpers/server.js';
import { approved, draft, inReview, newCandidate, newLine, newSet, thirdOrder, type Team } from './helpers/workflow.js';

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

const LIMITS = { maxOvershootPct: 10, maxSettlingTime: 2 };
const DESIGN = thirdOrder(-3, 4, -40);

async function lineWithApproved() {
  const line = await newLine(team);
  const set = await newSet(team, line.id);
  const revision = await approved(team, set.id, LIMITS);
  const candidate = await newCandidate(team, line.id, DESIGN);
  return { line, set, revision, candidate };
}

describe('POST /api/candidates/:id/assessments', () => {
  it('When the line has one approved revision, then it is used, and the stored assessment pins revision id, hash, engine version and the engine’s result', async () => {
    const { revision, candidate } = await lineWithApproved();
    const r = await team.controls.post(`/api/candidates/${candidate.id}/assessments`, {});
    expect(r.status).toBe(201);
    expect(r.body).toMatchObject({ candidateId: candidate.id, revisionId: revision.id, revisionSha256: revision.sha256, engineVersion: ENGINE_VERSION, revisionStatus: 'approved' });
    expect(r.body.createdBy.email).toBe('controls@example.com');
    expect(r.body.result).toEqual(JSON.parse(JSON.stringify(evaluate(DESIGN, LIMITS))));
    const back = await team.auditor.get(`/api/assessments/${r.body.id}`);
    expect(back.body).toEqual(r.body);
    const audit = await team.admin.get(`/api/audit-events?entityType=assessment&entityId=${r.body.id}`);
    expect(audit.body.items[0]).toMatchObject({ action: 'assessment.create', before: null });
    const listed = await team.auditor.get(`/api/candidates/${candidate.id}`);
    expect(listed.body.latest).toEqual([
      expect.objectContaining({ assessmentId: r.body.id, revisionId: revision.id, revisionNumber: 1, verdict: r.body.result.verdict, revisionStatus: 'approved' }),
    ]);
  });

  it('When the revision is later retired, then the stored assessment stays on it and says retired', async () => {
    const { set, revision, candidate } = await lineWithApproved();
    const made = await team.controls.post(`/api/candidates/${candidate.id}/assessments`, { revisionId: revision.id });
    expect(made.status).toBe(201);
    await approved(team, set.id, { maxOvershootPct: 5 });
    const back = await team.auditor.get(`/api/assessments/${made.body.id}`);
    expect(back.body).toMatchObject({ revisionId: revision.id, revisionSha256: revision.sha256, revisionStatus: 'retired' });
  });

  it('When the line has two approved revisions (two sets) and none is named, then 400 asks for revisionId; naming one works', async () => {
    const { line, candidate } = await lineWithApproved();
    const other = await newSet(team, line.id);
    const second = await approved(team, other.id, { maxSettlingTime: 3 });
    const r = await team.controls.post(`/api/candidates/${candidate.id}/assessments`, {});
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('revision_required');
    expect(r.body.error.fields).toHaveProperty('revisionId');
    const named = await team.controls.post(`/api/candidates/${candidate.id}/assessments`, { revisionId: second.id });
    expect(named.status).toBe(201);
    expect(named.body.revisionId).toBe(second.id);
  });

  it('When nothing is approved yet, then 400 with a clear message', async () => {
    const line = await newLine(team);
    const set = await newSet(team, line.id);
    await inReview(team, set.id, LIMITS);
    const candidate = await newCandidate(team, line.id, DESIGN);
    const r = await team.controls.post(`/api/candidates/${candidate.id}/assessments`, {});
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('no_approved_revision');
    expect(r.body.error.message).toMatch(/no approved/i);
  });

  it('When the revision is a draft or in review, then 409 and nothing is stored', async () => {
    const { set, candidate } = await lineWithApproved();
    const d = await draft(team, set.id, LIMITS);
    const rev = await inReview(team, set.id, LIMITS);
    for (const id of [d.id, rev.id]) {
      const r = await team.controls.post(`/api/candidates/${candidate.id}/assessments`, { revisionId: id });
      expect(r.status).toBe(409);
      expect(r.body.error.code).toBe('revision_not_approved');
    }
    expect((await team.auditor.get(`/api/candidates/${candidate.id}/assessments`)).body.total).toBe(0);
  });

  it('When the revision belongs to another product line, then 400 names revisionId', async () => {
    const a = await lineWithApproved();
    const b = await lineWithApproved();
    const r = await team.controls.post(`/api/candidates/${a.candidate.id}/assessments`, { revisionId: b.revision.id });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('revisionId');
  });

  it('When revisionId is not a number, then 400 names it', async () => {
    const { candidate } = await lineWithApproved();
    const r = await team.controls.post(`/api/candidates/${candidate.id}/assessments`, { revisionId: 'latest' });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('revisionId');
  });

  it.each(['systems_engineer', 'auditor'] as const)('When a %s assesses, then 403 and nothing is stored', async (role) => {
    const { candidate } = await lineWithApproved();
    const c = role === 'auditor' ? team.auditor : team.systems;
    expect((await c.post(`/api/candidates/${candidate.id}/assessments`, {})).status).toBe(403);
    expect((await c.get(`/api/candidates/${candidate.id}/assessments`)).body.total).toBe(0);
  });

  it('When the candidate does not exist, then 404; signed out, 401', async () => {
    expect((await team.controls.post('/api/candidates/999999/assessments', {})).status).toBe(404);
    expect((await new TestClient(url).post('/api/candidates/1/assessments', {})).status).toBe(401);
  });

  it('When a revision this process still knows as approved has been retired since, then storing refuses with 409 revision_retired and keeps nothing', async () => {
    const { set, revision, candidate } = await lineWithApproved();
    expect((await team.controls.post(`/api/candidates/${candidate.id}/assessments`, { revisionId: revision.id })).status).toBe(201);
    await approved(team, set.id, { maxOvershootPct: 5 }); // retires the first revision
    const r = await team.controls.post(`/api/candidates/${candidate.id}/assessments`, { revisionId: revision.id });
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe('revision_retired');
    expect((await team.auditor.get(`/api/candidates/${candidate.id}/assessments`)).body.total).toBe(1);
  });

  it('When 40 assessments arrive at once (stored together in one commit), then each answer names its own row and its own audit event, and the chain stays intact', async () => {
    const { revision, candidate } = await lineWithApproved();
    const answers = await Promise.all(Array.from({ length: 40 }, () => team.controls.post(`/api/candidates/${candidate.id}/assessments`, { revisionId: revision.id })));
    expect(answers.map((a) => a.status)).toEqual(Array(40).fill(201));
    const ids = answers.map((a) => a.body.id as number);
    expect(new Set(ids).size).toBe(40);
    for (const a of answers) {
      const back = await team.auditor.get(`/api/assessments/${a.body.id}`);
      expect(back.body).toEqual(a.body);
      const audit = await team.admin.get(`/api/audit-events?entityType=assessment&entityId=${a.body.id}`);
      expect(audit.body.items).toHaveLength(1);
      expect(audit.body.items[0].after).toMatchObject({ id: a.body.id, candidateId: candidate.id, revisionId: revision.id });
    }
    expect((await team.auditor.get(`/api/candidates/${candidate.id}/assessments?limit=100`)).body.total).toBe(40);
    expect((await team.auditor.get('/api/audit-events/verify')).body.intact).toBe(true);
  });
});

describe('GET /api/candidates/:id/assessments and GET /api/assessments/:id', () => {
  it('When a candidate was assessed twice, then both are listed newest first; latest keeps one per revision', async () => {
    const { candidate, revision } = await lineWithApproved();
    const one = await team.controls.post(`/api/candidates/${candidate.id}/assessments`, {});
    const two = await team.admin.post(`/api/candidates/${candidate.id}/assessments`, {});
    const list = await team.auditor.get(`/api/candidates/${candidate.id}/assessments`);
    expect(list.body.total).toBe(2);
    expect(list.body.items.map((a: { id: number }) => a.id)).toEqual([two.body.id, one.body.id]);
    const c = await team.auditor.get(`/api/candidates/${candidate.id}`);
    expect(c.body.latest).toHaveLength(1);
    expect(c.body.latest[0]).toMatchObject({ assessmentId: two.body.id, revisionId: revision.id });
  });

  it('When the assessment does not exist, then 404', async () => {
    expect((await team.auditor.get('/api/assessments/999999')).status).toBe(404);
    expect((await team.auditor.get('/api/candidates/999999/assessments')).status).toBe(404);
  });
});
