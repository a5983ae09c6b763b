import { createHash } from 'node:crypto';

import { QueryTypes, type Sequelize } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { TestClient, signedIn } from './helpers/client.js';
import { startTestServer, stopTestServer, uniqueEmail } from './helpers/server.js';
import { approved, newLine, newSet, thirdOrder, uniqueName, type Team } from './helpers/workflow.js';

let url: string;
let sequelize: Sequelize;
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

/** A pipeline: no cookie, no CSRF token, only the bearer header. */
function pipeline(secret: string) {
  const c = new TestClient(url);
  const auth = { authorization: `Bearer ${secret}` };
  return {
    get: (path: string) => c.request('GET', path, undefined, { headers: auth }),
    post: (path: string, body: unknown) => c.request('POST', path, body, { headers: auth }),
    delete: (path: string) => c.request('DELETE', path, undefined, { headers: auth }),
  };
}

async function newToken(client: TestClient, name = uniqueName('Pipeline token'), expiresInDays?: number) {
  const r = await client.post('/api/tokens', { name, ...(expiresInDays ? { expiresInDays } : {}) });
  expect(r.status).toBe(201);
  return r.body as { token: { id: number; prefix: string; name: string; expiresAt: string }; secret: string };
}

describe('POST /api/tokens', () => {
  it('When a controls engineer creates a token, then the secret comes back once, only its SHA-256 is stored, and the list shows the prefix only', async () => {
    const { token, secret } = await newToken(team.controls, 'Nightly assessments', 30);
    expect(secret).toMatch(/^pc_[A-Za-z0-9_-]{43}$/);
    expect(token.prefix).toBe(secret.slice(0, 10));
    const days = (Date.parse(token.expiresAt) - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(29);
    expect(days).toBeLessThanOrEqual(30);
    const [row] = await sequelize.query<{ token_hash: string; prefix: string }>('SELECT token_hash, prefix FROM api_tokens WHERE id = ?', { replacements: [token.id], type: QueryTypes.SELECT });
    expect(row!.token_hash).toBe(createHash('sha256').update(secret).digest('hex'));
    const list = await team.controls.get('/api/tokens');
    expect(list.status).toBe(200);
    expect(list.body.items.find((t: { id: number }) => t.id === token.id)).toMatchObject({ name: 'Nightly assessments', prefix: token.prefix, revokedAt: null, lastUsedAt: null });
    expect(JSON.stringify(list.body)).not.toContain(secret);
    const audit = await team.admin.get(`/api/audit-events?entityType=api_token&entityId=${token.id}`);
    expect(audit.body.items[0]).toMatchObject({ action: 'token.created', actorEmail: 'controls@example.com' });
    expect(JSON.stringify(audit.body)).not.toContain(secret.slice(10));
  });

  it('When the name is empty or the lifetime is out of range, then 400 names the field', async () => {
    const a = await team.controls.post('/api/tokens', { name: ' ' });
    expect(a.status).toBe(400);
    expect(a.body.error.fields).toHaveProperty('name');
    const b = await team.controls.post('/api/tokens', { name: 'x', expiresInDays: 0 });
    expect(b.status).toBe(400);
    expect(b.body.error.fields).toHaveProperty('expiresInDays');
    const c = await team.controls.post('/api/tokens', { name: 'x', expiresInDays: 10_000 });
    expect(c.status).toBe(400);
  });

  it('When an auditor creates a token, then it reads (200) but every write is refused (403)', async () => {
    const { secret } = await newToken(team.auditor);
    const p = pipeline(secret);
    expect((await p.get('/api/product-lines')).status).toBe(200);
    const write = await p.post('/api/product-lines', { name: uniqueName('Auditor line'), description: '' });
    expect(write.status).toBe(403);
    expect(write.body.error.code).toBe('forbidden');
  });

  it('When a request with a token tries to create or revoke tokens, then 403 session_required (a leaked token cannot mint more)', async () => {
    const { token, secret } = await newToken(team.controls);
    const p = pipeline(secret);
    expect((await p.post('/api/tokens', { name: 'more' })).body.error.code).toBe('session_required');
    expect((await p.delete(`/api/tokens/${token.id}`)).status).toBe(403);
  });

  it('When signed out, then 401', async () => {
    expect((await new TestClient(url).post('/api/tokens', { name: 'x' })).status).toBe(401);
  });
});

describe('Authorization: Bearer', () => {
  it('When a pipeline uses a controls engineer’s token, then it creates a candidate and an assessment with no cookie and no CSRF header, as that engineer, and the use is audited', async () => {
    const line = await newLine(team);
    const set = await newSet(team, line.id);
    const revision = await approved(team, set.id, { maxOvershootPct: 10, maxSettlingTime: 2 });
    const { token, secret } = await newToken(team.controls);
    const p = pipeline(secret);

    const candidate = await p.post(`/api/product-lines/${line.id}/candidates`, { name: uniqueName('Pipeline candidate'), notes: 'from CI', design: thirdOrder(-3, 4, -40) });
    expect(candidate.status).toBe(201);
    expect(candidate.body.createdBy.email).toBe('controls@example.com');
    const assessment = await p.post(`/api/candidates/${candidate.body.id}/assessments`, { revisionId: revision.id });
    expect(assessment.status).toBe(201);
    expect(assessment.body).toMatchObject({ candidateId: candidate.body.id, revisionId: revision.id });
    expect(assessment.body.createdBy.email).toBe('controls@example.com');

    const used = await team.admin.get(`/api/audit-events?action=token.used&entityId=${token.id}`);
    expect(used.body.items.length).toBeGreaterThanOrEqual(1);
    expect(used.body.items[0]).toMatchObject({ entityType: 'api_token', actorEmail: 'controls@example.com' });
    const made = await team.admin.get(`/api/audit-events?entityType=assessment&entityId=${assessment.body.id}`);
    expect(made.body.items[0]).toMatchObject({ action: 'assessment.create', actorEmail: 'controls@example.com' });
    const listed = (await team.controls.get('/api/tokens')).body.items.find((t: { id: number }) => t.id === token.id);
    expect(listed.lastUsedAt).not.toBeNull();
  });

  it('When the token is revoked, then it is refused with 401 token_revoked and nothing is written', async () => {
    const line = await newLine(team);
    const { token, secret } = await newToken(team.controls);
    expect((await pipeline(secret).get('/api/product-lines')).status).toBe(200);
    const revoked = await team.controls.request('DELETE', `/api/tokens/${token.id}`);
    expect(revoked.status).toBe(200);
    expect(revoked.body.revokedAt).not.toBeNull();
    const r = await pipeline(secret).post(`/api/product-lines/${line.id}/candidates`, { name: uniqueName('Late'), notes: '', design: thirdOrder(-3, 4, -40) });
    expect(r.status).toBe(401);
    expect(r.body.error.code).toBe('token_revoked');
    expect((await team.auditor.get(`/api/product-lines/${line.id}/candidates`)).body.total).toBe(0);
    expect((await team.controls.request('DELETE', `/api/tokens/${token.id}`)).status).toBe(409);
  });

  it('When the token has expired, then 401 token_expired', async () => {
    const { token, secret } = await newToken(team.controls);
    // Moving the expiry into the past stands in for waiting a day.
    await sequelize.query('UPDATE api_tokens SET expires_at = ? WHERE id = ?', { replacements: [new Date(Date.now() - 1000), token.id] });
    const r = await pipeline(secret).get('/api/product-lines');
    expect(r.status).toBe(401);
    expect(r.body.error.code).toBe('token_expired');
  });

  it('When the owner is deactivated, then the token stops working (401); unknown or malformed tokens are 401 token_invalid', async () => {
    const email = uniqueEmail('token-owner');
    const created = await team.admin.post('/api/users', { email, name: 'Token Owner', role: 'controls_engineer', password: 'a-long-test-password-8' });
    expect(created.status).toBe(201);
    const owner = new TestClient(url);
    expect((await owner.login(email, 'a-long-test-password-8')).status).toBe(200);
    const { secret } = await newToken(owner);
    expect((await pipeline(secret).get('/api/auth/me')).body.user.email).toBe(email);
    expect((await team.admin.patch(`/api/users/${created.body.id}`, { active: false })).status).toBe(200);
    const r = await pipeline(secret).get('/api/product-lines');
    expect(r.status).toBe(401);
    expect(r.body.error.code).toBe('account_inactive');

    expect((await pipeline(`pc_${'A'.repeat(43)}`).get('/api/product-lines')).body.error.code).toBe('token_invalid');
    expect((await pipeline('not-a-token').get('/api/product-lines')).status).toBe(401);
  });

  it('When a bad bearer token comes with a good session cookie, then the token decides: 401', async () => {
    const r = await team.controls.request('GET', '/api/product-lines', undefined, { headers: { authorization: 'Bearer pc_wrong' } });
    expect(r.status).toBe(401);
  });
});

describe('DELETE /api/tokens/:id', () => {
  it('When someone else revokes my token, then 404; when an admin does, then 200 and admins can list everyone’s tokens', async () => {
    const { token } = await newToken(team.controls);
    const other = await team.systems.request('DELETE', `/api/tokens/${token.id}`);
    expect(other.status).toBe(404);
    expect((await team.systems.get('/api/tokens?all=true')).status).toBe(403);
    const all = await team.admin.get('/api/tokens?all=true&limit=500');
    expect(all.body.items.some((t: { id: number }) => t.id === token.id)).toBe(true);
    const r = await team.admin.request('DELETE', `/api/tokens/${token.id}`);
    expect(r.status).toBe(200);
    const audit = await team.admin.get(`/api/audit-events?entityType=api_token&entityId=${token.id}`);
    expect(audit.body.items[0]).toMatchObject({ action: 'token.revoked', actorEmail: 'admin@example.com' });
  });

  it('When the id is not a number, then 404', async () => {
    expect((await team.controls.request('DELETE', '/api/tokens/abc')).status).toBe(404);
  });
});
