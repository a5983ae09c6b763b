// How each field of a requirements object is named in checks, tables and
// reports, with its unit and which way a limit points. One copy, used by the
// web client and the PDF reports alike.
export interface RequirementWord {
  name: string;
  unit: string;
  /** 'max': the value must stay at or below the limit; 'min': at or above; 'setting': not a limit. */
  kind: 'max' | 'min' | 'setting';
}

export const REQUIREMENT_WORDS: Record<string, RequirementWord> = {
  maxOvershootPct: { name: 'Percent overshoot', unit: '%', kind: 'max' },
  maxSettlingTime: { name: 'Settling time', unit: 's', kind: 'max' },
  settlingBandPct: { name: 'Settling band', unit: '%', kind: 'setting' },
  maxPeakTime: { name: 'Peak time', unit: 's', kind: 'max' },
  maxRiseTime: { name: 'Rise time (10-90 %)', unit: 's', kind: 'max' },
  minDampingRatio: { name: 'Damping ratio', unit: '', kind: 'min' },
  maxNaturalFrequency: { name: 'Natural frequency', unit: 'rad/s', kind: 'max' },
  dominanceRatio: { name: 'Dominance ratio', unit: '', kind: 'setting' },
  marginPct: { name: 'Margin', unit: '%', kind: 'setting' },
};

export function requirementWord(key: string): RequirementWord {
  return REQUIREMENT_WORDS[key] ?? { name: key, unit: '', kind: 'max' };
}
