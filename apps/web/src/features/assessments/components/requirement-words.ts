// How each limit of a requirement set reads on screen: its name, its unit and which way it points.

export interface RequirementWord {
  name: string;
  unit: string;
  /** 'max': the value must stay at or below the limit; 'min': at or above. */
  sense: 'max' | 'min';
}

export const REQUIREMENT_WORDS: Record<string, RequirementWord> = {
  maxOvershootPct: { name: 'Percent overshoot', unit: '%', sense: 'max' },
  maxSettlingTime: { name: 'Settling time', unit: 's', sense: 'max' },
  maxPeakTime: { name: 'Peak time', unit: 's', sense: 'max' },
  maxRiseTime: { name: 'Rise time (10-90 %)', unit: 's', sense: 'max' },
  minDampingRatio: { name: 'Damping ratio', unit: '', sense: 'min' },
  maxNaturalFrequency: { name: 'Natural frequency', unit: 'rad/s', sense: 'max' },
  settlingBandPct: { name: 'Settling band', unit: '%', sense: 'max' },
  dominanceRatio: { name: 'Dominance ratio', unit: '', sense: 'min' },
  marginPct: { name: 'Margin', unit: '%', sense: 'max' },
};

export function requirementWord(key: string): RequirementWord {
  return REQUIREMENT_WORDS[key] ?? { name: key, unit: '', sense: 'max' };
}
