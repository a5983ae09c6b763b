import { start, stop, type Running } from '../../src/server.js';

/** Starts the API in-process on an ephemeral port against the test database. */
export async function startTestServer(overrides: Record<string, string> = {}): Promise<Running> {
  if (!process.env.DB_PASSWORD) {
    throw new Error('The API tests need the test database: run them through `npm test` (or `npm test -- api`).');
  }
  // SMTP_PORT 0: the mail fake takes a free port, so test runs never collide with `npm start`.
  // Every test client signs in from 127.0.0.1 against one shared database, so the
  // per-address sign-in limit is lifted here; test/robustness/login-throttle.test.ts
  // sets it back to the default and uses forwarded addresses of its own.
  return start({ PORT: '0', SMTP_PORT: '0', LOG_LEVEL: 'silent', NODE_ENV: 'test', LOGIN_MAX_FAILURES_PER_ADDRESS: '100000', ...overrides });
}

export { stop as stopTestServer };

let counter = 0;
/** A unique e-mail per call so tests never collide on the shared database. */
export function uniqueEmail(prefix = 'person'): string {
  counter += 1;
  return `${prefix}.${Date.now().toString(36)}.${counter}@test.example.com`;
}
