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
  SESSION_SECRET: z.string().min(32, 'must be at least 32 characters'),
  SESSION_MAX_AGE_HOURS: z.coerce.number().positive().max(24 * 30).default(8),
  COOKIE_SECURE: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
  TRUST_PROXY: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
  WEB_DIST: z.string().optional(),
  LOG_LEVEL: z.enum(['silent', 'error', 'info']).default('info'),
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
