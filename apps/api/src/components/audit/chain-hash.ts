import { createHash } from 'node:crypto';

import { canonicalJson } from '../../lib/canonical-json.js';

export interface ChainedFields {
  occurredAt: string;
  actorId: number | null;
  actorEmail: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  productLineId: number | null;
  beforeJson: string | null;
  afterJson: string | null;
}

/** sha256(prevHash + canonical JSON of the event): each link pins all before it. */
export function chainHash(prevHash: string, fields: ChainedFields): string {
  return createHash('sha256').update(prevHash).update('\n').update(canonicalJson(fields)).digest('hex');
}
