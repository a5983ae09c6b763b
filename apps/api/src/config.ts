import { z } from 'zod';

// Every setting the API reads, checked once at start. A bad or missing value
// stops start-up with a list naming each variable.
const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().min(1).default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(5180),
  DB_HOST: z.string().min(1).default('127.0.0.1'),
  DB_PORT: z.coerce.number().int().min(1).max(65535).default(3407),
  DB_NAME: z.string().regex(/^[A-Za-z0-9_]+$/, 'letters, digits and _ only').default('polecourt'),
  DB_USER: z.string().min(1).default('polecourt'),
  DB_PASSWORD: z.string().min(1, 'set by the start script; see README'),
  DB_POOL_MAX: z.coerce.number().int().min(1).max(100).default(10),
  // API processes on this machine (node:cluster): 1 serves from one process; more
  // fork that many HTTP processes sharing PORT, with the mail fake, the mail
  // sender and the object-storage fake run once, in the parent.
  API_PROCESSES: z.coerce.number().int().min(1).max(64).default(1),
  SESSION_SECRET: z.string().min(32, 'must be at least 32 characters'),
  SESSION_MAX_AGE_HOURS: z.coerce.number().positive().max(24 * 30).default(8),
  COOKIE_SECURE: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
  TRUST_PROXY: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
  WEB_DIST: z.string().optional(),
  LOG_LEVEL: z.enum(['silent', 'error', 'info']).default('info'),
  // Sign-in throttling: after this many failed sign-ins within the window, for one
  // account or from one address, sign-in answers 429 until the oldest one ages out.
  LOGIN_MAX_FAILURES: z.coerce.number().int().min(1).max(10_000).default(10),
  LOGIN_MAX_FAILURES_PER_ADDRESS: z.coerce.number().int().min(1).max(100_000).default(10),
  LOGIN_WINDOW_MINUTES: z.coerce.number().int().min(1).max(24 * 60).default(15),
  // Mail. With MAIL_FAKE=true the app runs its own SMTP fake on 127.0.0.1:SMTP_PORT
  // (0 = any free port) and sends to it; messages show under Outbox. Set
  // MAIL_FAKE=false and SMTP_HOST etc. to send through a real mail server.
  MAIL_FAKE: z.enum(['true', 'false']).default('true').transform((v) => v === 'true'),
  SMTP_HOST: z.string().min(1).optional(),
  SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(2526),
  SMTP_SECURE: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
  SMTP_USER: z.string().min(1).optional(),
  SMTP_PASSWORD: z.string().min(1).optional(),
  MAIL_FROM: z.string().min(3).default('Polecourt <polecourt@localhost>'),
  PUBLIC_URL: z.url({ protocol: /^https?$/, message: 'must be an http(s) URL such as https://polecourt.example.com' }).optional(),
  MAIL_MAX_ATTEMPTS: z.coerce.number().int().min(1).max(20).default(5),
  MAIL_RETRY_BASE_MS: z.coerce.number().int().min(1).max(3_600_000).default(30_000),
  MAIL_POLL_MS: z.coerce.number().int().min(10).max(600_000).default(5_000),
  // Data folder for local state (signing certificate, the object-storage fake's files). The
  // start and test scripts set it to .data/dev or .data/test; without it, .data/ at the repository root.
  POLECOURT_DATA_DIR: z.string().min(1).optional(),
  POLECOURT_ROOT: z.string().min(1).optional(),
  // Report signing. Without these a self-signed certificate is made on first start and kept as
  // a PKCS#12 under the data folder; set both to sign with a certificate of your own.
  SIGNING_P12_PATH: z.string().min(1).optional(),
  SIGNING_P12_PASSPHRASE: z.string().min(1).optional(),
  // Report archive (object storage). S3_FAKE=true, the default outside production, runs a local
  // S3-compatible fake on 127.0.0.1:S3_PORT (default 5183; 0 = any free port, the default in tests)
  // with its files under the data folder. For a real bucket (with Object Lock retention) set
  // S3_FAKE=false, S3_BUCKET, S3_REGION, and S3_ENDPOINT for stores other than AWS; the keys may
  // be left out where the SDK's default credential chain applies.
  S3_FAKE: z.enum(['true', 'false']).optional().transform((v) => (v === undefined ? undefined : v === 'true')),
  S3_PORT: z.coerce.number().int().min(0).max(65535).optional(),
  S3_ENDPOINT: z.url({ protocol: /^https?$/, message: 'must be an http(s) URL such as https://s3.eu-central-1.amazonaws.com' }).optional(),
  S3_REGION: z.string().regex(/^[a-z0-9-]+$/, 'a region name such as eu-central-1').default('us-east-1'),
  S3_BUCKET: z
    .string()
    .regex(/^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/, '3 to 63 lower-case letters, digits, dots and hyphens')
    .default('polecourt-reports'),
  S3_FORCE_PATH_STYLE: z.enum(['true', 'false']).optional().transform((v) => (v === undefined ? undefined : v === 'true')),
  S3_ACCESS_KEY_ID: z.string().min(1).optional(),
  S3_SECRET_ACCESS_KEY: z.string().min(1).optional(),
}).superRefine((c, ctx) => {
  if (!c.MAIL_FAKE && !c.SMTP_HOST) ctx.addIssue({ code: 'custom', path: ['SMTP_HOST'], message: 'required when MAIL_FAKE=false' });
  if (!c.MAIL_FAKE && c.SMTP_PORT === 0) ctx.addIssue({ code: 'custom', path: ['SMTP_PORT'], message: 'must be a real port when MAIL_FAKE=false' });
  if (Boolean(c.SMTP_USER) !== Boolean(c.SMTP_PASSWORD)) {
    ctx.addIssue({ code: 'custom', path: [c.SMTP_USER ? 'SMTP_PASSWORD' : 'SMTP_USER'], message: 'set SMTP_USER and SMTP_PASSWORD together' });
  }
  if (Boolean(c.S3_ACCESS_KEY_ID) !== Boolean(c.S3_SECRET_ACCESS_KEY)) {
    ctx.addIssue({ code: 'custom', path: [c.S3_ACCESS_KEY_ID ? 'S3_SECRET_ACCESS_KEY' : 'S3_ACCESS_KEY_ID'], message: 'set S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY together' });
  }
  if (c.SIGNING_P12_PATH && !c.SIGNING_P12_PASSPHRASE) {
    ctx.addIssue({ code: 'custom', path: ['SIGNING_P12_PASSPHRASE'], message: 'required with SIGNING_P12_PATH' });
  }
});

export type Config = z.infer<typeof envSchema>;

export class ConfigError extends Error {
  constructor(readonly problems: string[]) {
    super(`Polecourt cannot start; fix these settings:\n${problems.map((p) => `  - ${p}`).join('\n')}`);
    this.name = 'ConfigError';
  }
}

export function loadConfig(env: Record<string, string | undefined> = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    throw new ConfigError(parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`));
  }
  return parsed.data;
}
