import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { signedIn } from './helpers/client.js';
import { startTestServer, stopTestServer } from './helpers/server.js';
import { approved, newCandidate, newLine, newSet, thirdOrder, type Team } from './helpers/workflow.js';

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

// zeta = 0.8: about 1.5 % overshoot; zeta = 0.5: about 16 % (second-order
// overshoot formula); the real pole at -300 is far enough not to matter.
const CALM = thirdOrder(-4, 3, -300);
const LIVELY = thirdOrder(-2, 3.4641, -300);
const FORMULA = "=cmd|' /C calc'!A0";
const QUOTED = 'A calm, "quiet" loop';

/** One line with a candidate in each coverage state against revision 2 (revision 1 retired). */
async function lineInEveryState() {
  const line = await newLine(team);
  const set = await newSet(team, line.id);
  const old = await approved(team, set.id, { maxOvershootPct: 10 });
  const retiredOnly = await newCandidate(team, line.id, CALM, 'D assessed only against the old revision');
  expect((await team.controls.post(`/api/candidates/${retiredOnly.id}/assessments`, {})).status).toBe(201);
  const current = await approved(team, set.id, { maxOvershootPct: 10, maxSettlingTime: 3 });
  const compliant = await newCandidate(team, line.id, CALM, QUOTED);
  const noncompliant = await newCandidate(team, line.id, LIVELY, FORMULA);
  const never = await newCandidate(team, line.id, CALM, 'C never assessed');
  for (const c of [compliant, noncompliant]) expect((await team.controls.post(`/api/candidates/${c.id}/assessments`, {})).status).toBe(201);
  return { line, set, old, current, compliant, noncompliant, never, retiredOnly };
}

describe('GET /api/product-lines/:id/coverage', () => {
  it('When every state occurs, then each candidate shows its latest verdict against the approved revision', async () => {
    const s = await lineInEveryState();
    const r = await team.auditor.get(`/api/product-lines/${s.line.id}/coverage`);
    expect(r.status).toBe(200);
    const status = Object.fromEntries(r.body.items.map((x: { candidateId: number; status: string }) => [x.candidateId, x.status]));
    expect(status).toEqual({
      [s.compliant.id]: 'compliant',
      [s.noncompliant.id]: 'noncompliant',
      [s.never.id]: 'never_assessed',
      [s.retiredOnly.id]: 'retired_only',
    });
    expect(r.body.items.every((x: { revisionId: number }) => x.revisionId === s.current.id)).toBe(true);
    const old = r.body.items.find((x: { candidateId: number }) => x.candidateId === s.retiredOnly.id);
    expect(old.assessedRevisionId).toBe(s.old.id);
  });

  it.each([
    ['never_assessed', 'never'],
    ['retired_only', 'retiredOnly'],
    ['noncompliant', 'noncompliant'],
  ] as const)('When filtered by %s, then only that candidate is listed', async (filter, key) => {
    const s = await lineInEveryState();
    const r = await team.auditor.get(`/api/product-lines/${s.line.id}/coverage?filter=${filter}`);
    expect(r.status).toBe(200);
    expect(r.body.items.map((x: { candidateId: number }) => x.candidateId)).toEqual([s[key].id]);
  });

  it('When exported as CSV, then there is a header row, cells are quoted and a formula-like name is defused with a leading quote', async () => {
    const s = await lineInEveryState();
    const r = await team.auditor.get(`/api/product-lines/${s.line.id}/coverage?format=csv`);
    expect(r.status).toBe(200);
    expect(r.headers.get('content-type')).toMatch(/text\/csv/);
    const text = r.body as string;
    const lines = text.trimEnd().split('\r\n');
    expect(lines[0]).toBe('candidate_id,candidate,requirement_set,revision,status,assessment_id,assessed_at,assessed_revision_id');
    expect(lines).toHaveLength(5);
    const formulaLine = lines.find((l) => l.startsWith(`${s.noncompliant.id},`))!;
    // The name starts with '=' and holds a quote character: defused, then quoted with the quote doubled.
    expect(formulaLine.split(',').slice(0, 2).join(',')).toBe(`${s.noncompliant.id},'=cmd|' /C calc'!A0`);
    expect(text).not.toMatch(/(^|,)=cmd/m);
    expect(formulaLine).toContain('noncompliant');
    expect(lines.find((l) => l.startsWith(`${s.compliant.id},`))).toMatch(new RegExp(`^${s.compliant.id},"A calm, ""quiet"" loop",`));
  });

  it('When a line has no approved revision, then each candidate is listed once as never assessed', async () => {
    const line = await newLine(team);
    const c = await newCandidate(team, line.id, CALM);
    const r = await team.controls.get(`/api/product-lines/${line.id}/coverage`);
    expect(r.body.items).toEqual([expect.objectContaining({ candidateId: c.id, revisionId: null, status: 'never_assessed' })]);
  });

  it('When the filter or format is unknown, then 400 names it; an unknown line is 404', async () => {
    const line = await newLine(team);
    const bad = await team.auditor.get(`/api/product-lines/${line.id}/coverage?filter=some`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('filter');
    const fmt = await team.auditor.get(`/api/product-lines/${line.id}/coverage?format=xlsx`);
    expect(fmt.body.error.fields).toHaveProperty('format');
    expect((await team.auditor.get('/api/product-lines/999999/coverage')).status).toBe(404);
  });
});
