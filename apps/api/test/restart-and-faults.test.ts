import { afterAll, describe, expect, it } from 'vitest';

import { TestClient, signedIn } from './helpers/client.js';
import { startDatabase, stopDatabase } from './helpers/db-control.js';
import { startTestServer, stopTestServer } from './helpers/server.js';

afterAll(async () => {
  await startDatabase();
  await stopTestServer();
});

describe('sessions', () => {
  it('When the API process restarts, then a signed-in session still works (sessions live in MariaDB)', async () => {
    const first = await startTestServer();
    const c = await signedIn(first.url, 'controls_engineer');
    await stopTestServer();
    const second = await startTestServer();
    const moved = new TestClient(second.url);
    // Same cookie, new process (and new port).
    (moved as unknown as { cookies: Map<string, string> }).cookies = (c as unknown as { cookies: Map<string, string> }).cookies;
    const me = await moved.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe('controls@example.com');
    await stopTestServer();
  });
});

describe('GET /api/health', () => {
  it('When the database stops, then health answers 503 db down and signed-in routes 503; when it is back, both recover', async () => {
    const { url } = await startTestServer();
    const c = await signedIn(url, 'admin');
    expect((await c.get('/api/health')).body).toEqual({ ok: true, db: 'up' });

    await stopDatabase();
    const down = await c.get('/api/health');
    expect(down.status).toBe(503);
    expect(down.body).toEqual({ ok: false, db: 'down' });
    const users = await c.get('/api/users');
    expect(users.status).toBe(503);
    expect(users.body.error.code).toBe('db_unavailable');

    await startDatabase();
    let up = await c.get('/api/health');
    for (let i = 0; i < 20 && up.status !== 200; i++) {
      await new Promise((r) => setTimeout(r, 250));
      up = await c.get('/api/health');
    }
    expect(up.body).toEqual({ ok: true, db: 'up' });
    expect((await c.get('/api/users')).status).toBe(200);
  });
});
