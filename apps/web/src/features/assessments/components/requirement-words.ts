// How each limit reads in the checks table: the shared words of @polecourt/contracts,
// with the direction a check compares in.
import { requirementWord as sharedWord } from '@polecourt/contracts';

export interface RequirementWord {
  name: string;
  unit: string;
  /** 'max': the value must stay at or below the limit; 'min': at or above. */
  sense: 'max' | 'min';
}

export function requirementWord(key: string): RequirementWord {
  const w = sharedWord(key);
  return { name: w.name, unit: w.unit, sense: w.kind === 'min' ? 'min' : 'max' };
}
