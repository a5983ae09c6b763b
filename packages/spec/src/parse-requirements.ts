import { requirementsSchema } from './schemas/requirements.js';
import { SpecInputError } from './spec-input-error.js';
import type { Requirements } from './types.js';

/** Requirements after checking, with the defaults filled in. */
export type ResolvedRequirements = Requirements & {
  settlingBandPct: number;
  dominanceRatio: number;
  marginPct: number;
};

// Edge check for a requirement set: every problem is reported in one message,
// the path names the first offending field ('' for the object as a whole).
export function parseRequirements(input: unknown): ResolvedRequirements {
  const result = requirementsSchema.safeParse(input);
  if (!result.success) {
    const issues = result.error.issues;
    const first = issues[0];
    let path = first ? first.path.map(String).join('.') : '';
    if (first && first.code === 'unrecognized_keys' && path === '') path = String(first.keys[0] ?? '');
    const message = issues.map((i) => i.message).join('; ') || 'Requirements are not valid';
    throw new SpecInputError('invalid_requirements', message, path);
  }
  const r = result.data;
  const resolved: ResolvedRequirements = {
    ...r,
    settlingBandPct: r.settlingBandPct ?? 2,
    dominanceRatio: r.dominanceRatio ?? 5,
    marginPct: r.marginPct ?? 0,
  };
  return resolved;
}
