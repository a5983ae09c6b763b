import type { z } from 'zod';

import { AppError } from './app-error.js';

/** Parse with a shared zod schema; a failure is a 400 naming every bad field. */
export function validate<S extends z.ZodType>(schema: S, input: unknown, code = 'invalid_input'): z.output<S> {
  const parsed = schema.safeParse(input);
  if (parsed.success) return parsed.data;
  const fields: Record<string, string> = {};
  for (const issue of parsed.error.issues) {
    const path = issue.path.map(String).join('.') || '_';
    fields[path] ??= issue.message;
  }
  const first = Object.entries(fields)[0];
  const message = first ? (first[0] === '_' ? first[1] : `${first[0]}: ${first[1]}`) : 'The request is not valid.';
  throw AppError.badRequest(code, message, fields);
}
