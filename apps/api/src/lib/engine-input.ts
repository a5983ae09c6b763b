import { AppError } from './app-error.js';

interface SpecInputErrorLike extends Error {
  code: string;
  path: string;
}

function isSpecInputError(err: unknown): err is SpecInputErrorLike {
  // Matched by name, as in the error middleware, so two copies of the engine still agree.
  return err instanceof Error && err.name === 'SpecInputError';
}

/**
 * The field path of an engine input error, under the body member it came
 * from: 'poles[1].im' in `design` becomes 'design.poles[1].im'.
 */
export function prefixedField(prefix: string, path: string): string {
  if (!path) return prefix;
  return path.startsWith('[') ? `${prefix}${path}` : `${prefix}.${path}`;
}

/** Runs an engine parser; its input error becomes a 400 naming the field under `prefix`. */
export function parseWithEngine<T>(prefix: string, parse: () => T): T {
  try {
    return parse();
  } catch (err) {
    if (!isSpecInputError(err)) throw err;
    const field = prefixedField(prefix, err.path);
    throw AppError.badRequest(err.code || 'invalid_input', `${field}: ${err.message}`, { [field]: err.message });
  }
}

/** Like parseWithEngine but returns the field errors instead of throwing (for upload rows). */
export function tryParseWithEngine<T>(prefix: string, parse: () => T): { value: T } | { errors: Record<string, string> } {
  try {
    return { value: parse() };
  } catch (err) {
    if (!isSpecInputError(err)) throw err;
    return { errors: { [prefixedField(prefix, err.path)]: err.message } };
  }
}
