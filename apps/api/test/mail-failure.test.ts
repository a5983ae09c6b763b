import { createServer } from 'node:net';

import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import type { Running } from '../src/server.js';
import { TestClient, signedIn } from './helpers/client.js';
import { waitForQueueRow } from './helpers/mail.js';
import { startTestServer, stopTestServer, uniqueEmail } from './helpers/server.js';

/** A loopback port with nothing listening on it: bound, read, released. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as { port: number };
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return port;
}

let running: Running;
let admin: TestClient;
beforeAll(async () => {
  // A real SMTP server that is not there: every send is refused at connect.
  running = await startTestServer({
    MAIL_FAKE: 'false',
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(await closedPort()),
    MAIL_MAX_ATTEMPTS: '5',
    MAIL_RETRY_BASE_MS: '10',
    MAIL_POLL_MS: '20',
  });
  admin = await signedIn(running.url, 'admin');
});
afterAll(stopTestServer);

describe('queued sending when the mail server is down', () => {
  it('When the SMTP server refuses connections, then the request still succeeds and the queue row ends failed after 5 tries with the error', async () => {
    expect(running.mailFake).toBeNull();
    const email = uniqueEmail('unreachable');
    const r = await admin.post('/api/users', { email, name: 'Unreachable Person', role: 'auditor' });
    expect(r.status).toBe(201);
    expect(r.body.email).toBe(email);

    const row = await waitForQueueRow(running.sequelize, email, (q) => q.status === 'failed');
    expect(row.kind).toBe('invitation');
    expect(row.attempts).toBe(5);
    expect(row.last_error).toMatch(/ECONNREFUSED|connect/i);

    // The account was saved all the same, and the rest of the app is unaffected.
    const listed = await admin.get(`/api/users?limit=500`);
    expect(listed.body.items.some((u: { email: string }) => u.email === email)).toBe(true);
    expect((await new TestClient(running.url).get('/api/health')).status).toBe(200);
  });
});
