// zod/mini (the tree-shakable build of zod) keeps the validator small: this file is in the first chunk.
import * as z from 'zod/mini';

// Build-time settings (Vite exposes only VITE_* variables to the browser). Checked once at start
// so a bad value stops the app with a list of every problem instead of failing later in a fetch.
const envSchema = z.object({
  VITE_API_BASE_URL: z._default(
    z.string().check(
      z.trim(),
      z.refine((v) => /^\/(?!\/)/.test(v) || /^https?:\/\/[^/]+/.test(v), {
        message: 'must be a path starting with "/" (same origin) or an absolute http(s) URL',
      }),
    ),
    '/api',
  ),
  VITE_REQUEST_TIMEOUT_MS: z._default(
    z.coerce.number({ message: 'must be a number of milliseconds' }).check(
      z.refine((v) => Number.isInteger(v), { message: 'must be a whole number of milliseconds' }),
      z.minimum(1000, 'must be at least 1000 (1 s)'),
      z.maximum(300_000, 'must be at most 300000 (5 min)'),
    ),
    20_000,
  ),
});

export interface Env {
  apiBaseUrl: string;
  requestTimeoutMs: number;
}

/** Parses raw variables; throws one Error naming every missing or bad variable. */
export function parseEnv(raw: Record<string, unknown>): Env {
  // Empty strings mean "not set" (an empty line in a .env file), so the default applies.
  const cleaned = Object.fromEntries(Object.entries(raw).filter(([, v]) => v !== '' && v !== undefined));
  const result = z.safeParse(envSchema, cleaned);
  if (!result.success) {
    const lines = result.error.issues.map((issue) => `- ${issue.path.join('.') || '(root)'}: ${issue.message}`);
    throw new Error(`Polecourt web client: invalid environment variables:\n${lines.join('\n')}`);
  }
  return {
    apiBaseUrl: result.data.VITE_API_BASE_URL.replace(/\/+$/, ''),
    requestTimeoutMs: result.data.VITE_REQUEST_TIMEOUT_MS,
  };
}

export const env: Env = parseEnv(import.meta.env as Record<string, unknown>);
