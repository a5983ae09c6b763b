import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { DEMO, TestClient, signedIn } from './helpers/client.js';
import { startTestServer, stopTestServer, uniqueEmail } from './helpers/server.js';

let url: string;
let admin: TestClient;
beforeAll(async () => {
  url = (await startTestServer()).url;
  admin = await signedIn(url, 'admin');
});
afterAll(stopTestServer);

const NOT_ADMIN = ['systems_engineer', 'controls_engineer', 'auditor'] as const;

function newUser(role = 'auditor') {
  return { email: uniqueEmail(), name: 'Test Person', role, password: 'a-long-test-password' };
}

describe('GET /api/users', () => {
  it('When the admin lists users, then items and total come back without password hashes', async () => {
    const r = await admin.get('/api/users?limit=2&offset=0');
    expect(r.status).toBe(200);
    expect(r.body.items).toHaveLength(2);
    expect(r.body.total).toBeGreaterThanOrEqual(4);
    expect(JSON.stringify(r.body)).not.toMatch(/passwordHash|scrypt/);
  });

  it.each(NOT_ADMIN)('When a %s lists users, then 403', async (role) => {
    const c = await signedIn(url, role);
    const r = await c.get('/api/users');
    expect(r.status).toBe(403);
    expect(r.body.error.code).toBe('forbidden');
  });

  it('When signed out, then 401', async () => {
    expect((await new TestClient(url).get('/api/users')).status).toBe(401);
  });

  it('When limit is not a number, then 400 names limit', async () => {
    const r = await admin.get('/api/users?limit=lots');
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('limit');
  });
});

describe('POST /api/users', () => {
  it('When the admin invites a systems engineer, then 201, the person can sign in, and an audit event records it', async () => {
    const input = newUser('systems_engineer');
    const r = await admin.post('/api/users', input);
    expect(r.status).toBe(201);
    expect(r.body).toMatchObject({ email: input.email, role: 'systems_engineer', active: true });
    const c = new TestClient(url);
    expect((await c.login(input.email, input.password)).status).toBe(200);
    const audit = await admin.get(`/api/audit-events?entityType=user&entityId=${r.body.id}&action=user.create`);
    expect(audit.status).toBe(200);
    expect(audit.body.items[0].after.email).toBe(input.email);
    expect(audit.body.items[0].actorEmail).toBe(DEMO.admin);
  });

  it('When the role is not one of the four and the password short, then 400 names both fields', async () => {
    const r = await admin.post('/api/users', { ...newUser(), role: 'superuser', password: 'short' });
    expect(r.status).toBe(400);
    expect(Object.keys(r.body.error.fields)).toEqual(expect.arrayContaining(['role', 'password']));
  });

  it('When the e-mail is taken, then 409 email_taken', async () => {
    const r = await admin.post('/api/users', { ...newUser(), email: DEMO.auditor });
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe('email_taken');
  });

  it.each(NOT_ADMIN)('When a %s tries to create a user, then 403 and no user is made', async (role) => {
    const c = await signedIn(url, role);
    const input = newUser('admin');
    const r = await c.post('/api/users', input);
    expect(r.status).toBe(403);
    expect((await new TestClient(url).login(input.email, input.password)).status).toBe(401);
  });
});

describe('PATCH /api/users/:id', () => {
  it('When the admin changes a role, then the person sees the new role at once', async () => {
    const input = newUser('auditor');
    const created = await admin.post('/api/users', input);
    const person = new TestClient(url);
    await person.login(input.email, input.password);
    const r = await admin.patch(`/api/users/${created.body.id}`, { role: 'controls_engineer' });
    expect(r.status).toBe(200);
    expect(r.body.role).toBe('controls_engineer');
    expect((await person.get('/api/auth/me')).body.user.role).toBe('controls_engineer');
  });

  it('When the admin deactivates someone, then their session stops working and they cannot sign in', async () => {
    const input = newUser('controls_engineer');
    const created = await admin.post('/api/users', input);
    const person = new TestClient(url);
    await person.login(input.email, input.password);
    const r = await admin.patch(`/api/users/${created.body.id}`, { active: false });
    expect(r.status).toBe(200);
    expect(r.body.active).toBe(false);
    expect((await person.get('/api/auth/me')).status).toBe(401);
    expect((await new TestClient(url).login(input.email, input.password)).status).toBe(401);
  });

  it('When the admin tries to deactivate themselves, then 409', async () => {
    const me = await admin.get('/api/auth/me');
    const r = await admin.patch(`/api/users/${me.body.user.id}`, { active: false });
    expect(r.status).toBe(409);
  });

  it('When the user does not exist, then 404', async () => {
    expect((await admin.patch('/api/users/999999', { name: 'X' })).status).toBe(404);
    expect((await admin.patch('/api/users/abc', { name: 'X' })).status).toBe(404);
  });

  it('When the body has an unknown field, then 400', async () => {
    const me = await admin.get('/api/auth/me');
    const r = await admin.patch(`/api/users/${me.body.user.id}`, { passwordHash: 'x' });
    expect(r.status).toBe(400);
  });

  it.each(NOT_ADMIN)('When a %s tries to change a role, then 403', async (role) => {
    const c = await signedIn(url, role);
    const me = await c.get('/api/auth/me');
    const r = await c.patch(`/api/users/${me.body.user.id}`, { role: 'admin' });
    expect(r.status).toBe(403);
    expect((await c.get('/api/auth/me')).body.user.role).toBe(role);
  });
});
