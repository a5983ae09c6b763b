import { createHash } from 'node:crypto';

import { canonicalJson } from '../../lib/canonical-json.js';

/** The approval's content hash: SHA-256 of the requirements' canonical JSON (keys sorted). */
export function requirementsSha256(requirements: Record<string, number>): string {
  return createHash('sha256').update(canonicalJson(requirements)).digest('hex');
}
