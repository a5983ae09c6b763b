import { createHash } from 'node:crypto';

import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import type { Running } from '../src/server.js';
import { DEMO, TestClient, signedIn } from './helpers/client.js';
import { queueRowsFor, setPasswordLink, waitForMail } from './helpers/mail.js';
import { startTestServer, stopTestServer, uniqueEmail } from './helpers/server.js';

let running: Running;
let url: string;
let admin: TestClient;
beforeAll(async () => {
  running = await startTestServer();
  url = running.url;
  admin = await signedIn(url, 'admin');
});
afterAll(stopTestServer);

const NEW_PASSWORD = 'tarnwell-gimbal-42-axis';

async function invite(name = 'Invited Person', role = 'systems_engineer') {
  const email = uniqueEmail('invite');
  const created = await admin.post('/api/users', { email, name, role });
  expect(created.status).toBe(201);
  const [message] = await waitForMail(admin, email);
  return { email, id: created.body.id as number, token: setPasswordLink(message!).token };
}

async function auditFor(userId: number, action: string) {
  const r = await admin.get(`/api/audit-events?entityType=user&entityId=${userId}&action=${action}`);
  expect(r.status).toBe(200);
  return r.body.items as { actorEmail: string | null; after: Record<string, unknown> }[];
}

function expire(token: string): Promise<unknown> {
  const hash = createHash('sha256').update(token).digest('hex');
  return running.sequelize.query('UPDATE password_tokens SET expires_at = ? WHERE token_hash = ?', {
    replacements: [new Date(Date.now() - 60_000), hash],
    type: QueryTypes.UPDATE,
  });
}

describe('POST /api/auth/set-password', () => {
  it('When the invitation link is used, then the password is set once, the person can sign in, and the link is refused after', async () => {
    const { email, id, token } = await invite();
    const signedOut = new TestClient(url);
    const r = await signedOut.post('/api/auth/set-password', { token, password: NEW_PASSWORD });
    expect(r.status).toBe(200);
    expect(r.body).toEqual({ email });
    expect((await new TestClient(url).login(email, NEW_PASSWORD)).status).toBe(200);

    const again = await signedOut.post('/api/auth/set-password', { token, password: 'another-long-password-9' });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('token_invalid');
    expect(again.body.error.message).toMatch(/already been used/);
    // The second try changed nothing.
    expect((await new TestClient(url).login(email, NEW_PASSWORD)).status).toBe(200);

    const set = await auditFor(id, 'auth.password_set');
    expect(set).toHaveLength(1);
    expect(set[0]!.actorEmail).toBe(email);
    expect(set[0]!.after.purpose).toBe('invite');
    expect(await auditFor(id, 'auth.password_set_refused')).toHaveLength(1);
    const sent = await auditFor(id, 'user.invite_sent');
    expect(sent[0]!.actorEmail).toBe(DEMO.admin);
    expect(JSON.stringify(sent)).not.toContain(token);
  });

  it('When the link is opened in a browser signed in as someone else (no CSRF token on the page yet), then it still works', async () => {
    const { email, token } = await invite();
    const browser = await signedIn(url, 'auditor');
    const r = await browser.post('/api/auth/set-password', { token, password: NEW_PASSWORD }, { csrf: false });
    expect(r.status).toBe(200);
    expect((await new TestClient(url).login(email, NEW_PASSWORD)).status).toBe(200);
    // Other writes of that session still need the token.
    expect((await browser.post('/api/auth/logout', {}, { csrf: false })).status).toBe(403);
  });

  it('When the link has expired, then 400 token_invalid says so and the password is not set', async () => {
    const { email, token } = await invite();
    await expire(token);
    const r = await new TestClient(url).post('/api/auth/set-password', { token, password: NEW_PASSWORD });
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('token_invalid');
    expect(r.body.error.message).toMatch(/expired/);
    expect((await new TestClient(url).login(email, NEW_PASSWORD)).status).toBe(401);
  });

  it('When the token is made up, then 400 token_invalid', async () => {
    const r = await new TestClient(url).post('/api/auth/set-password', { token: 'x'.repeat(43), password: NEW_PASSWORD });
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('token_invalid');
    expect(r.body.error.fields).toHaveProperty('token');
  });

  it('When the password is too short or a common one, then 400 names password and the link still works', async () => {
    const { email, token } = await invite();
    const short = await new TestClient(url).post('/api/auth/set-password', { token, password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.password).toMatch(/at least 12/);
    for (const common of ['password1234', 'Qwerty123456', 'aaaaaaaaaaaaaaaa']) {
      const r = await new TestClient(url).post('/api/auth/set-password', { token, password: common });
      expect(r.status).toBe(400);
      expect(r.body.error.fields.password).toMatch(/guess/);
    }
    const own = await new TestClient(url).post('/api/auth/set-password', { token, password: `${email}-x` });
    expect(own.status).toBe(400);
    expect(own.body.error.fields).toHaveProperty('password');
    expect((await new TestClient(url).post('/api/auth/set-password', { token, password: NEW_PASSWORD })).status).toBe(200);
  });
});

describe('POST /api/users/:id/resend-invite', () => {
  it('When the admin resends an invitation, then a new link arrives and the old one stops working', async () => {
    const { email, id, token: oldToken } = await invite();
    const r = await admin.post(`/api/users/${id}/resend-invite`);
    expect(r.status).toBe(202);
    expect(r.body.user.email).toBe(email);
    const messages = await waitForMail(admin, email, 2);
    const newToken = setPasswordLink(messages[0]!).token;
    expect(newToken).not.toBe(oldToken);
    const old = await new TestClient(url).post('/api/auth/set-password', { token: oldToken, password: NEW_PASSWORD });
    expect(old.status).toBe(400);
    expect(old.body.error.code).toBe('token_invalid');
    expect((await new TestClient(url).post('/api/auth/set-password', { token: newToken, password: NEW_PASSWORD })).status).toBe(200);
  });

  it('When the person has already set a password, then 409 password_already_set', async () => {
    const me = await admin.get('/api/auth/me');
    const r = await admin.post(`/api/users/${me.body.user.id}/resend-invite`);
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe('password_already_set');
  });

  it('When the user does not exist, then 404', async () => {
    expect((await admin.post('/api/users/999999/resend-invite')).status).toBe(404);
  });

  it.each(['systems_engineer', 'controls_engineer', 'auditor'] as const)('When a %s tries, then 403 and nothing is queued', async (role) => {
    const { email, id } = await invite();
    const c = await signedIn(url, role);
    expect((await c.post(`/api/users/${id}/resend-invite`)).status).toBe(403);
    expect(await queueRowsFor(running.sequelize, email)).toHaveLength(1);
  });
});

describe('POST /api/auth/request-reset', () => {
  it('When the e-mail belongs to no account, then 202 all the same and nothing is queued', async () => {
    const nobody = uniqueEmail('nobody');
    const r = await new TestClient(url).post('/api/auth/request-reset', { email: nobody });
    expect(r.status).toBe(202);
    expect(r.body.message).toMatch(/If an active account uses that address/);
    expect(await queueRowsFor(running.sequelize, nobody)).toEqual([]);
  });

  it('When the account exists, then the same 202, and the reset link sets a new password that replaces the old one', async () => {
    const email = uniqueEmail('resetter');
    const created = await admin.post('/api/users', { email, name: 'Reset Person', role: 'auditor', password: 'the-first-password-1' });
    expect(created.status).toBe(201);
    const r = await new TestClient(url).post('/api/auth/request-reset', { email: email.toUpperCase() });
    expect(r.status).toBe(202);
    const [message] = await waitForMail(admin, email);
    expect(message!.subject).toBe('Reset your Polecourt password');
    expect(message!.text).toContain('Hello Reset Person,');
    const { url: link, token } = setPasswordLink(message!);
    expect(link.origin + link.pathname).toBe(`${url}/set-password`);

    // A second request right away sends no second message.
    expect((await new TestClient(url).post('/api/auth/request-reset', { email })).status).toBe(202);
    expect(await queueRowsFor(running.sequelize, email)).toHaveLength(1);

    expect((await new TestClient(url).post('/api/auth/set-password', { token, password: NEW_PASSWORD })).status).toBe(200);
    expect((await new TestClient(url).login(email, 'the-first-password-1')).status).toBe(401);
    expect((await new TestClient(url).login(email, NEW_PASSWORD)).status).toBe(200);
    const requested = await auditFor(created.body.id, 'auth.reset_requested');
    expect(requested.map((e) => e.after.sent)).toEqual([false, true]); // newest first
    expect((await auditFor(created.body.id, 'auth.password_set'))[0]!.after.purpose).toBe('reset');
  });

  it('When the account is deactivated, then 202 and nothing is queued', async () => {
    const email = uniqueEmail('inactive');
    const created = await admin.post('/api/users', { email, name: 'Gone Person', role: 'auditor', password: 'the-first-password-1' });
    expect((await admin.patch(`/api/users/${created.body.id}`, { active: false })).status).toBe(200);
    expect((await new TestClient(url).post('/api/auth/request-reset', { email })).status).toBe(202);
    expect(await queueRowsFor(running.sequelize, email)).toEqual([]);
  });

  it('When the e-mail is not an address, then 400 names email', async () => {
    const r = await new TestClient(url).post('/api/auth/request-reset', { email: 'not-an-address' });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('email');
  });
});
