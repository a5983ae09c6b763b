import { assessModel } from './assess-model.js';
import { parseDesign } from './parse-design.js';
import { parseRequirements } from './parse-requirements.js';
import { SpecInputError } from './spec-input-error.js';
import type { Assessment } from './types.js';

export interface BatchError {
  error: { code: string; message: string; path: string };
}

// Many designs against one requirement set, parsed once (a bad set throws
// SpecInputError for the whole batch). A bad design gives its error object in
// its place and the rest go on, in order.
export function evaluateBatch(designs: unknown[], requirements?: unknown): (Assessment | BatchError)[] {
  const req = requirements === undefined ? null : parseRequirements(requirements);
  return designs.map((design) => {
    try {
      return assessModel(parseDesign(design), req);
    } catch (e) {
      if (e instanceof SpecInputError) return { error: { code: e.code, message: e.message, path: e.path } };
      throw e;
    }
  });
}
