// Named imports, not the z namespace: the namespace keeps all of zod (every
// locale, the JSON-schema tools) in a bundle, about 450 KB more to load.
import { number, strictObject } from 'zod';
import type { z } from 'zod';

// The requirement-set revision schema, shared by the engine, the API and the
// web forms, so each message names its field in words a user reads. One
// message per field covers every way the value can be wrong (missing type,
// NaN, Infinity, out of range): zod 4 numbers already refuse NaN and Infinity.

const LIMIT_FIELDS = [
  'maxOvershootPct',
  'maxSettlingTime',
  'maxPeakTime',
  'maxRiseTime',
  'minDampingRatio',
  'maxNaturalFrequency',
] as const;

const KNOWN_FIELDS = [...LIMIT_FIELDS, 'settlingBandPct', 'dominanceRatio', 'marginPct'] as const;

export const requirementMessages = {
  maxOvershootPct: 'Max overshoot must be between 0 and 100 %',
  maxSettlingTime: 'Max settling time must be a positive number of seconds',
  settlingBandPct: 'Settling band must be more than 0 and at most 20 %',
  maxPeakTime: 'Max peak time must be a positive number of seconds',
  maxRiseTime: 'Max rise time must be a positive number of seconds',
  minDampingRatio: 'Min damping ratio must be more than 0 and at most 1',
  maxNaturalFrequency: 'Max natural frequency must be a positive number of rad/s',
  dominanceRatio: 'Dominance ratio must be a number of at least 1',
  marginPct: 'Margin must be at least 0 and less than 100 %',
  atLeastOneLimit:
    'Give at least one limit: max overshoot, max settling time, max peak time, max rise time, min damping ratio or max natural frequency',
  notAnObject: 'Requirements must be an object with named limits',
} as const;

const m = requirementMessages;
const positive = (message: string) => number({ error: message }).gt(0, { error: message });

export const requirementsSchema = strictObject(
  {
    maxOvershootPct: positive(m.maxOvershootPct).lt(100, { error: m.maxOvershootPct }).optional(),
    maxSettlingTime: positive(m.maxSettlingTime).optional(),
    settlingBandPct: positive(m.settlingBandPct).lte(20, { error: m.settlingBandPct }).optional(),
    maxPeakTime: positive(m.maxPeakTime).optional(),
    maxRiseTime: positive(m.maxRiseTime).optional(),
    minDampingRatio: positive(m.minDampingRatio).lte(1, { error: m.minDampingRatio }).optional(),
    maxNaturalFrequency: positive(m.maxNaturalFrequency).optional(),
    dominanceRatio: number({ error: m.dominanceRatio }).gte(1, { error: m.dominanceRatio }).optional(),
    marginPct: number({ error: m.marginPct }).gte(0, { error: m.marginPct }).lt(100, { error: m.marginPct }).optional(),
  },
  {
    error: (issue) =>
      issue.code === 'unrecognized_keys'
        ? `Unknown field ${issue.keys.map((k) => `"${k}"`).join(', ')}; the known fields are ${KNOWN_FIELDS.join(', ')}`
        : m.notAnObject,
  },
).refine((r) => LIMIT_FIELDS.some((k) => r[k] !== undefined), { error: m.atLeastOneLimit });

export type RequirementsInput = z.input<typeof requirementsSchema>;
