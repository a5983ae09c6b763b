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

/** The hashed fields of a stored event row, exactly as `chainHash` saw them at append. */
export function chainedFieldsOf(row: {
  occurredAt: Date | string;
  actorId: number | null;
  actorEmail: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  productLineId: number | null;
  beforeJson: string | null;
  afterJson: string | null;
}): ChainedFields {
  return {
    occurredAt: new Date(row.occurredAt).toISOString(),
    actorId: row.actorId,
    actorEmail: row.actorEmail,
    action: row.action,
    entityType: row.entityType,
    entityId: row.entityId,
    productLineId: row.productLineId,
    beforeJson: row.beforeJson,
    afterJson: row.afterJson,
  };
}
