import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { TestClient, signedIn } from './helpers/client.js';
import { startTestServer, stopTestServer, uniqueEmail } from './helpers/server.js';

let url: string;
let admin: TestClient;
beforeAll(async () => {
  url = (await startTestServer()).url;
  admin = await signedIn(url, 'admin');
});
afterAll(stopTestServer);

const OLD = 'the-first-password-9';
async function person(): Promise<{ email: string; client: TestClient }> {
  const email = uniqueEmail('changer');
  expect((await admin.post('/api/users', { email, name: 'Pass Changer', role: 'systems_engineer', password: OLD })).status).toBe(201);
  const client = new TestClient(url);
  expect((await client.login(email, OLD)).status).toBe(200);
  return { email, client };
}

describe('POST /api/auth/change-password', () => {
  it('When the current password is right and the new one is good, then 204, the old one stops working, the new one works, and it is audited', async () => {
    const { email, client } = await person();
    const r = await client.post('/api/auth/change-password', { currentPassword: OLD, newPassword: 'a-brand-new-passphrase' });
    expect(r.status).toBe(204);
    expect((await new TestClient(url).login(email, OLD)).status).toBe(401);
    expect((await new TestClient(url).login(email, 'a-brand-new-passphrase')).status).toBe(200);
    const events = await admin.get('/api/audit-events?action=auth.password_changed&limit=50');
    expect(events.body.items.some((e: { actorEmail: string }) => e.actorEmail === email)).toBe(true);
  });

  it('When the current password is wrong, then 400 names currentPassword and nothing changes', async () => {
    const { email, client } = await person();
    const r = await client.post('/api/auth/change-password', { currentPassword: 'not-my-password', newPassword: 'a-brand-new-passphrase' });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('currentPassword');
    expect((await new TestClient(url).login(email, OLD)).status).toBe(200);
  });

  it('When the new password is short, common, the same, or contains the e-mail, then 400 names newPassword', async () => {
    const { email, client } = await person();
    for (const newPassword of ['short', 'password1234', OLD, `${email.split('@')[0]}-x`]) {
      const r = await client.post('/api/auth/change-password', { currentPassword: OLD, newPassword });
      expect(r.status, newPassword).toBe(400);
      expect(r.body.error.fields, newPassword).toHaveProperty('newPassword');
    }
    expect((await new TestClient(url).login(email, OLD)).status).toBe(200);
  });

  it('When signed out, without CSRF, or with an API token, then 401, 403, 403', async () => {
    const { client } = await person();
    expect((await new TestClient(url).post('/api/auth/change-password', { currentPassword: OLD, newPassword: 'a-brand-new-passphrase' })).status).toBe(401);
    expect((await client.post('/api/auth/change-password', { currentPassword: OLD, newPassword: 'a-brand-new-passphrase' }, { csrf: false })).status).toBe(403);
    const token = await client.post('/api/tokens', { name: 'ci' });
    const r = await new TestClient(url).request('POST', '/api/auth/change-password', { currentPassword: OLD, newPassword: 'a-brand-new-passphrase' }, { headers: { authorization: `Bearer ${token.body.secret}` } });
    expect(r.status).toBe(403);
    expect(r.body.error.code).toBe('session_required');
  });
});
