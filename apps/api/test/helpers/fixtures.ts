// A private cast for robustness tests: four fresh accounts (one per role) and
// a product line with a set, an approved and a draft revision, a candidate and
// its assessment, all made by those accounts. Counting only their rows lets a
// test say "nothing changed" while other test files write to the same database.
import { QueryTypes, type Sequelize } from 'sequelize';
import { expect } from 'vitest';

import { TestClient, signedIn } from './client.js';
import { uniqueEmail } from './server.js';
import { thirdOrder, uniqueName } from './workflow.js';

export const CAST_PASSWORD = 'robustness-cast-passphrase';

export interface Cast {
  admin: TestClient;
  systems: TestClient;
  controls: TestClient;
  auditor: TestClient;
  userIds: number[];
  /** An account the cast's admin may edit (PATCH /api/users/:id). */
  spareUserId: number;
  ids: { line: number; set: number; approved: number; draft: number; candidate: number; assessment: number };
}

export async function makeCast(url: string, extraHeaders: Record<string, string> = {}): Promise<Cast> {
  const demoAdmin = await signedIn(url, 'admin');
  const userIds: number[] = [];
  const clients: Record<string, TestClient> = {};
  for (const role of ['admin', 'systems_engineer', 'controls_engineer', 'auditor'] as const) {
    const email = uniqueEmail(`cast-${role}`);
    const r = await demoAdmin.post('/api/users', { email, name: `Cast ${role}`, role, password: CAST_PASSWORD });
    expect(r.status).toBe(201);
    userIds.push(r.body.id);
    const c = new TestClient(url);
    const login = await c.request('POST', '/api/auth/login', { email, password: CAST_PASSWORD }, { headers: extraHeaders });
    expect(login.status).toBe(200);
    c.csrfToken = login.body.csrfToken;
    clients[role] = c;
  }
  const admin = clients.admin!;
  const systems = clients.systems_engineer!;
  const controls = clients.controls_engineer!;
  const auditor = clients.auditor!;
  const spare = await admin.post('/api/users', { email: uniqueEmail('cast-spare'), name: 'Cast spare', role: 'auditor' });
  expect(spare.status).toBe(201);
  userIds.push(spare.body.id);

  const line = await systems.post('/api/product-lines', { name: uniqueName('Robustness line'), description: 'robustness tests' });
  expect(line.status).toBe(201);
  const set = await systems.post(`/api/product-lines/${line.body.id}/requirement-sets`, { name: uniqueName('Robustness set'), purpose: '' });
  expect(set.status).toBe(201);
  const rev = await systems.post(`/api/requirement-sets/${set.body.id}/revisions`, { requirements: { maxOvershootPct: 10, maxSettlingTime: 2 }, rationale: 'robustness' });
  expect(rev.status).toBe(201);
  expect((await systems.post(`/api/revisions/${rev.body.id}/submit`)).status).toBe(200);
  expect((await admin.post(`/api/revisions/${rev.body.id}/approve`, { password: CAST_PASSWORD, impactAcknowledged: true })).status).toBe(200);
  const draft = await systems.post(`/api/requirement-sets/${set.body.id}/revisions`, { requirements: { maxOvershootPct: 8 }, rationale: 'draft' });
  expect(draft.status).toBe(201);
  const candidate = await controls.post(`/api/product-lines/${line.body.id}/candidates`, { name: uniqueName('Robustness candidate'), notes: '', design: thirdOrder(-3, 4, -40) });
  expect(candidate.status).toBe(201);
  const assessment = await controls.post(`/api/candidates/${candidate.body.id}/assessments`, { revisionId: rev.body.id });
  expect(assessment.status).toBe(201);
  return {
    admin,
    systems,
    controls,
    auditor,
    userIds,
    spareUserId: spare.body.id,
    ids: { line: line.body.id, set: set.body.id, approved: rev.body.id, draft: draft.body.id, candidate: candidate.body.id, assessment: assessment.body.id },
  };
}

/**
 * One row that changes whenever the cast writes anything: its audit events,
 * the rows under its product line, its tokens, and a digest of the records a
 * PATCH could change.
 */
export async function castSnapshot(sequelize: Sequelize, cast: Cast, address: string): Promise<string> {
  const users = cast.userIds.join(',');
  const { line, set, draft, candidate, assessment } = cast.ids;
  const [row] = await sequelize.query<Record<string, unknown>>(
    `SELECT
      (SELECT COUNT(*) FROM audit_events WHERE actor_id IN (${users})) AS n_audit,
      (SELECT COUNT(*) FROM product_lines WHERE created_by IN (${users})) AS n_lines,
      (SELECT COUNT(*) FROM requirement_sets WHERE product_line_id = ${line}) AS n_sets,
      (SELECT COUNT(*) FROM revisions WHERE requirement_set_id = ${set}) AS n_revisions,
      (SELECT COUNT(*) FROM candidates WHERE product_line_id = ${line}) AS n_candidates,
      (SELECT COUNT(*) FROM assessments WHERE candidate_id = ${candidate}) AS n_assessments,
      (SELECT COUNT(*) FROM reports WHERE assessment_id = ${assessment}) AS n_reports,
      (SELECT COUNT(*) FROM api_tokens WHERE user_id IN (${users})) AS n_tokens,
      (SELECT COUNT(*) FROM login_failures WHERE address = ?) AS n_failures,
      (SELECT MD5(CONCAT_WS('|', name, description)) FROM product_lines WHERE id = ${line}) AS line_digest,
      (SELECT MD5(CONCAT_WS('|', status, version, requirements_json, rationale)) FROM revisions WHERE id = ${draft}) AS draft_digest,
      (SELECT MD5(GROUP_CONCAT(CONCAT_WS('|', id, name, role, active, password_hash) ORDER BY id)) FROM users WHERE id IN (${users})) AS users_digest`,
    { replacements: [address], type: QueryTypes.SELECT },
  );
  return JSON.stringify(row);
}
