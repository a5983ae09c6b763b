import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { DEMO, DEMO_PASSWORD, TestClient, signedIn } from './helpers/client.js';
import { startTestServer, stopTestServer } from './helpers/server.js';

let url: string;
let sequelize: Awaited<ReturnType<typeof startTestServer>>['sequelize'];
beforeAll(async () => {
  const running = await startTestServer();
  url = running.url;
  sequelize = running.sequelize;
});
afterAll(stopTestServer);

describe('POST /api/auth/login', () => {
  it('When the demo controls engineer signs in, then the user and a CSRF token come back with an httpOnly SameSite=Lax cookie', async () => {
    const c = new TestClient(url);
    const r = await c.login(DEMO.controls_engineer, DEMO_PASSWORD);
    expect(r.status).toBe(200);
    expect(r.body.user).toMatchObject({ email: 'controls@example.com', role: 'controls_engineer' });
    expect(typeof r.body.user.id).toBe('number');
    expect(r.body.csrfToken).toMatch(/^[A-Za-z0-9_-]{40,}$/);
    const cookie = r.headers.getSetCookie().find((h) => h.startsWith('polecourt.sid='));
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(JSON.stringify(r.body)).not.toMatch(/hash|scrypt/i);
  });

  it('When the password is wrong or the e-mail unknown, then both answer the same 401', async () => {
    const wrong = await new TestClient(url).post('/api/auth/login', { email: DEMO.admin, password: 'not-the-password' });
    const unknown = await new TestClient(url).post('/api/auth/login', { email: 'nobody@example.com', password: 'not-the-password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.error.code).toBe('invalid_credentials');
  });

  it('When the e-mail is missing, then 400 names the field', async () => {
    const r = await new TestClient(url).post('/api/auth/login', { password: 'x' });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('email');
  });

  it('When the body is not JSON, then 400 invalid_json, not 500', async () => {
    const r = await new TestClient(url).request('POST', '/api/auth/login', '{"email": ', { headers: { 'content-type': 'application/json' } });
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('invalid_json');
  });
});

describe('GET /api/auth/me', () => {
  it('When signed out, then 401 with the error envelope', async () => {
    const r = await new TestClient(url).get('/api/auth/me');
    expect(r.status).toBe(401);
    expect(r.body.error.code).toBe('not_signed_in');
  });

  it('When signed in, then the same user and CSRF token as at login', async () => {
    const c = await signedIn(url, 'auditor');
    const r = await c.get('/api/auth/me');
    expect(r.status).toBe(200);
    expect(r.body.user.email).toBe(DEMO.auditor);
    expect(r.body.csrfToken).toBe(c.csrfToken);
  });
});

describe('POST /api/auth/logout', () => {
  it('When signed out through logout, then me answers 401 again', async () => {
    const c = await signedIn(url, 'systems_engineer');
    const out = await c.post('/api/auth/logout');
    expect(out.status).toBe(204);
    const me = await c.get('/api/auth/me');
    expect(me.status).toBe(401);
  });

  it('When the cookie of a session just read is replayed after logout, then it is refused at once (no kept copy of the session serves it)', async () => {
    const c = await signedIn(url, 'systems_engineer');
    expect((await c.get('/api/auth/me')).status).toBe(200);
    const copy = c.cookieHeader;
    expect((await c.post('/api/auth/logout')).status).toBe(204);
    const replay = await fetch(`${url}/api/auth/me`, { headers: { cookie: copy, accept: 'application/json' } });
    expect(replay.status).toBe(401);
  });
});

describe('session expiry', () => {
  it('When the stored session is past its expiry, then its cookie no longer signs in, even before the clean-up timer removes the row', async () => {
    const c = await signedIn(url, 'auditor');
    // The cookie is s:<sid>.<signature>, URL-encoded.
    const sid = decodeURIComponent(c.cookieHeader).match(/polecourt\.sid=s:([^.;]+)/)![1]!;
    await sequelize.query('UPDATE sessions SET expires = ? WHERE sid = ?', { replacements: [new Date(Date.now() - 60_000), sid] });
    expect((await c.get('/api/auth/me')).status).toBe(401);
  });
});

describe('CSRF rule', () => {
  it('When a signed-in write has no x-csrf-token, then 403 csrf_token_invalid and nothing changes', async () => {
    const c = await signedIn(url, 'systems_engineer');
    const r = await c.post('/api/auth/logout', {}, { csrf: false });
    expect(r.status).toBe(403);
    expect(r.body.error.code).toBe('csrf_token_invalid');
    expect((await c.get('/api/auth/me')).status).toBe(200);
  });

  it('When the token is wrong, then 403', async () => {
    const c = await signedIn(url, 'admin');
    c.csrfToken = 'x'.repeat(43);
    const r = await c.post('/api/users', { email: 'a@b.example', name: 'A', role: 'auditor', password: 'long-enough-password' });
    expect(r.status).toBe(403);
  });
});

describe('unknown routes', () => {
  it('When a route does not exist, then 404 with the envelope', async () => {
    const r = await new TestClient(url).get('/api/no-such-thing');
    expect(r.status).toBe(404);
    expect(r.body.error.code).toBe('not_found');
  });
});
