import { z } from 'zod';

/** Personal API tokens: `Authorization: Bearer pc_…` for pipelines. */
export const API_TOKEN_PREFIX = 'pc_';
export const API_TOKEN_DEFAULT_DAYS = 90;
export const API_TOKEN_MAX_DAYS = 365;

export const createApiTokenSchema = z
  .object({
    name: z.string().trim().min(1, 'Give the token a name, e.g. the pipeline that uses it').max(80, 'Name is too long (80 characters at most)'),
    expiresInDays: z
      .number({ message: 'expiresInDays must be a number of days' })
      .int('expiresInDays must be a whole number of days')
      .min(1, 'A token lives at least 1 day')
      .max(API_TOKEN_MAX_DAYS, `A token lives at most ${API_TOKEN_MAX_DAYS} days`)
      .optional(),
  })
  .strict();
export type CreateApiTokenInput = z.input<typeof createApiTokenSchema>;

/** A token as lists show it: never the secret, only its first characters. */
export interface ApiToken {
  id: number;
  name: string;
  prefix: string;
  owner: { id: number; name: string; email: string };
  createdAt: string;
  lastUsedAt: string | null;
  expiresAt: string;
  revokedAt: string | null;
}

/** What POST /api/tokens answers, once: the secret is not stored and cannot be shown again. */
export interface CreatedApiToken {
  token: ApiToken;
  secret: string;
}
