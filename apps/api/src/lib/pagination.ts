import { z } from 'zod';

import { AppError } from './app-error.js';
import { validate } from './validate.js';

const pageSchema = z.object({
  limit: z.coerce.number().int('limit must be a whole number').min(1, 'limit must be at least 1').max(500, 'limit may be at most 500').default(50),
  offset: z.coerce.number().int('offset must be a whole number').min(0, 'offset may not be negative').default(0),
});

export function parsePage(query: unknown): { limit: number; offset: number } {
  const q = (query ?? {}) as Record<string, unknown>;
  return validate(pageSchema, { limit: q.limit, offset: q.offset }, 'invalid_query');
}

const idSchema = z.coerce.number().int().positive().max(2 ** 31);

// Decimal digits only: Number() would also read '1e3', '0x1F', ' 7' or '+7' as ids.
const ID_TEXT = /^[1-9][0-9]{0,9}$/;

/** A path id that is not a positive integer names nothing: 404, not 500. */
export function parseId(raw: unknown, what: string): number {
  if (typeof raw === 'string' && !ID_TEXT.test(raw)) throw AppError.notFound(what);
  const parsed = idSchema.safeParse(raw);
  if (!parsed.success) throw AppError.notFound(what);
  return parsed.data;
}
