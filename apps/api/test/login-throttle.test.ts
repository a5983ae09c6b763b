import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { TestClient, signedIn } from './helpers/client.js';
import { startTestServer, stopTestServer, uniqueEmail } from './helpers/server.js';

// The limits at their defaults (10 failures per account or per address in 15
// minutes). TRUST_PROXY lets each test sign in "from" its own documentation
// address through X-Forwarded-For, so the tests neither see nor
// leave failures on 127.0.0.1, which every other test file shares.
let url: string;
let admin: TestClient;
beforeAll(async () => {
  url = (await startTestServer({ TRUST_PROXY: 'true', LOGIN_MAX_FAILURES: '10', LOGIN_MAX_FAILURES_PER_ADDRESS: '10', LOGIN_WINDOW_MINUTES: '15' })).url;
  admin = await signedIn(url, 'admin');
});
afterAll(stopTestServer);

let addressCounter = 0;
// IPv6 documentation addresses (RFC 3849, 2001:db8::/32) with a random run id, so a rerun within 15 minutes meets none of its old rows.
const runId = Math.floor(Math.random() * 0xffff).toString(16);
function freshAddress(): string {
  addressCounter += 1;
  return `2001:db8:${runId}::${addressCounter.toString(16)}`;
}

function signIn(email: string, password: string, from: string) {
  return new TestClient(url).request('POST', '/api/auth/login', { email, password }, { headers: { 'x-forwarded-for': from } });
}

const PASSWORD = 'a-long-test-password-7';
async function newAccount(): Promise<string> {
  const email = uniqueEmail('throttle');
  const r = await admin.post('/api/users', { email, name: 'Throttle Test', role: 'controls_engineer', password: PASSWORD });
  expect(r.status).toBe(201);
  return email;
}

describe('POST /api/auth/login throttling', () => {
  it('When an account has 10 failed sign-ins (from 10 addresses), then even the right password answers 429 too_many_attempts with Retry-After, and auth.throttled is audited', async () => {
    const email = await newAccount();
    for (let i = 0; i < 10; i++) expect((await signIn(email, 'wrong-password-guess', freshAddress())).status).toBe(401);
    const r = await signIn(email, PASSWORD, freshAddress());
    expect(r.status).toBe(429);
    expect(r.body.error.code).toBe('too_many_attempts');
    expect(r.body.error.message).toMatch(/Try again in \d+ minutes?/);
    const retryAfter = Number(r.headers.get('retry-after'));
    expect(Number.isInteger(retryAfter)).toBe(true);
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(15 * 60);
    const events = await admin.get('/api/audit-events?action=auth.throttled&limit=50');
    expect(events.status).toBe(200);
    expect(events.body.items.some((e: { after: { email?: string; scope?: string } }) => e.after?.email === email && e.after?.scope === 'account')).toBe(true);
  });

  it('When 9 failures are followed by a good sign-in, then the account starts again from zero', async () => {
    const email = await newAccount();
    for (let i = 0; i < 9; i++) expect((await signIn(email, 'wrong-password-guess', freshAddress())).status).toBe(401);
    expect((await signIn(email, PASSWORD, freshAddress())).status).toBe(200);
    for (let i = 0; i < 9; i++) expect((await signIn(email, 'wrong-password-guess', freshAddress())).status).toBe(401);
    expect((await signIn(email, PASSWORD, freshAddress())).status).toBe(200);
  });

  it('When one address has 10 failures on 10 different accounts, then that address is refused for any account, and other addresses are not', async () => {
    const from = freshAddress();
    for (let i = 0; i < 10; i++) expect((await signIn(uniqueEmail('nobody'), 'wrong-password-guess', from)).status).toBe(401);
    const email = await newAccount();
    const blocked = await signIn(email, PASSWORD, from);
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('too_many_attempts');
    expect(Number(blocked.headers.get('retry-after'))).toBeGreaterThan(0);
    expect((await signIn(email, PASSWORD, freshAddress())).status).toBe(200);
  });

  it('When someone signs in successfully from an address, then the failures of other accounts from that address still count', async () => {
    const from = freshAddress();
    const email = await newAccount();
    for (let i = 0; i < 9; i++) expect((await signIn(uniqueEmail('nobody'), 'wrong-password-guess', from)).status).toBe(401);
    expect((await signIn(email, PASSWORD, from)).status).toBe(200);
    expect((await signIn(uniqueEmail('nobody'), 'wrong-password-guess', from)).status).toBe(401);
    const r = await signIn(email, PASSWORD, from);
    expect(r.status).toBe(429);
  });

  it('When the body is invalid, then 400 and it is not counted as a failure', async () => {
    const email = await newAccount();
    const from = freshAddress();
    for (let i = 0; i < 12; i++) expect((await signIn(email, '', from)).status).toBe(400);
    expect((await signIn(email, PASSWORD, from)).status).toBe(200);
  });
});
