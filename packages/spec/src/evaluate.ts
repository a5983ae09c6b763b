import { assessModel } from './assess-model.js';
import { parseDesign } from './parse-design.js';
import { parseRequirements } from './parse-requirements.js';
import type { Assessment } from './types.js';

// The engine's front door: checks a design (and a requirement set, if given)
// and returns the contract's assessment. Bad input throws SpecInputError and
// nothing else; a valid but unstable model is an assessment, not an error.
export function evaluate(design: unknown, requirements?: unknown): Assessment {
  const req = requirements === undefined ? null : parseRequirements(requirements);
  return assessModel(parseDesign(design), req);
}
