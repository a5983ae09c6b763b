// What each field of a requirement-set revision is called on screen, its unit and a short
// help line. Shared by the revision editor, the diff, the impact table and the s-plane
// read-outs, so a limit is named the same way everywhere.
import { REQUIREMENT_FIELDS, type RequirementField } from '@polecourt/contracts';

export interface RequirementFieldInfo {
  field: RequirementField;
  label: string;
  /** Short name for tables and read-outs ("overshoot"). */
  short: string;
  unit: '%' | 's' | 'rad/s' | '';
  help: string;
  /** A limit (at least one is required) or a setting that shapes how limits are read. */
  kind: 'limit' | 'setting';
}

export const REQUIREMENT_FIELD_INFO: Record<RequirementField, RequirementFieldInfo> = {
  maxOvershootPct: {
    field: 'maxOvershootPct',
    label: 'Max overshoot',
    short: 'overshoot',
    unit: '%',
    help: 'Peak of the step response above its final value, in percent of the final value. Sets a damping-ratio floor.',
    kind: 'limit',
  },
  maxSettlingTime: {
    field: 'maxSettlingTime',
    label: 'Max settling time',
    short: 'settling time',
    unit: 's',
    help: 'Last time the response leaves the settling band. Sets a minimum decay rate (a vertical line).',
    kind: 'limit',
  },
  settlingBandPct: {
    field: 'settlingBandPct',
    label: 'Settling band',
    short: 'settling band',
    unit: '%',
    help: 'How close to the final value counts as settled.',
    kind: 'setting',
  },
  maxPeakTime: {
    field: 'maxPeakTime',
    label: 'Max peak time',
    short: 'peak time',
    unit: 's',
    help: 'Time of the highest point of the response. Sets a minimum damped frequency (two horizontal lines).',
    kind: 'limit',
  },
  maxRiseTime: {
    field: 'maxRiseTime',
    label: 'Max rise time (10–90 %)',
    short: 'rise time',
    unit: 's',
    help: 'From the first 10 % crossing to the first 90 % crossing. Sets a minimum natural frequency that depends on damping.',
    kind: 'limit',
  },
  minDampingRatio: {
    field: 'minDampingRatio',
    label: 'Min damping ratio',
    short: 'damping ratio',
    unit: '',
    help: 'A floor on zeta for the dominant poles, between 0 and 1 (a ray pair from the origin).',
    kind: 'limit',
  },
  maxNaturalFrequency: {
    field: 'maxNaturalFrequency',
    label: 'Max natural frequency',
    short: 'natural frequency',
    unit: 'rad/s',
    help: 'A ceiling on omega_n, e.g. to stay below a structural resonance (a circle about the origin).',
    kind: 'limit',
  },
  dominanceRatio: {
    field: 'dominanceRatio',
    label: 'Dominance ratio',
    short: 'dominance ratio',
    unit: '',
    help: 'How many times farther left the other poles and zeros must lie for the second-order view to hold. 5 is usual; 3 for rough sizing, 10 for demanding work.',
    kind: 'setting',
  },
  marginPct: {
    field: 'marginPct',
    label: 'Margin',
    short: 'margin',
    unit: '%',
    help: 'A guard band: every limit is tightened by this percentage for the verdict.',
    kind: 'setting',
  },
};

export const REQUIREMENT_FIELD_LIST: readonly RequirementFieldInfo[] = REQUIREMENT_FIELDS.map((f) => REQUIREMENT_FIELD_INFO[f]);

export function isRequirementField(name: string): name is RequirementField {
  return (REQUIREMENT_FIELDS as readonly string[]).includes(name);
}
