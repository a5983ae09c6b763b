import { start, stop } from '@polecourt/api';

/** The whole product in-process: API plus the built client, on a free port. */
export async function startApp(): Promise<string> {
  if (!process.env.DB_PASSWORD) throw new Error('Browser tests need the test database: run them through `npm test`.');
  // All test sign-ins come from 127.0.0.1 against one shared database: lift the per-address
  // sign-in limit (apps/api/test/robustness/login-throttle.test.ts checks it at its default).
  const running = await start({ PORT: '0', SMTP_PORT: '0', S3_PORT: '0', LOG_LEVEL: 'silent', LOGIN_MAX_FAILURES_PER_ADDRESS: '100000' });
  return running.url;
}

export const stopApp = stop;

export const DEMO_PASSWORD = 'polecourt-demo';
export const DEMO_ACCOUNTS = {
  admin: 'admin@example.com',
  systems_engineer: 'systems@example.com',
  controls_engineer: 'controls@example.com',
  auditor: 'auditor@example.com',
} as const;
export type DemoRole = keyof typeof DEMO_ACCOUNTS;
