import type { AuditFacets } from '@polecourt/contracts';

import { csvLine } from '../../lib/csv-writer.js';
import { personRefs } from '../../lib/person-refs.js';
import { auditRepository, type AuditFilter, type StoredAuditEvent } from './repository.js';

export const AUDIT_CSV_HEADER = ['Event', 'Time (UTC)', 'Actor e-mail', 'Action', 'Entity', 'Product line (current name)', 'Before', 'After', 'Hash'];

/** Filter choices: every action, entity type, actor and product line the trail mentions, with today's names. */
export async function auditFacets(): Promise<AuditFacets> {
  const ids = await auditRepository.facets();
  const [people, lines] = await Promise.all([personRefs(ids.actors.map((a) => a.id)), auditRepository.productLineNames(ids.productLineIds)]);
  return {
    actions: ids.actions,
    entityTypes: ids.entityTypes,
    actors: ids.actors
      .map((a) => ({ id: a.id, email: people.get(a.id)?.email ?? a.email, name: people.get(a.id)?.name ?? null }))
      .sort((x, y) => x.email.localeCompare(y.email) || x.id - y.id),
    productLines: ids.productLineIds
      .map((id) => ({ id, name: lines.get(id) ?? null }))
      .sort((x, y) => (x.name ?? '').localeCompare(y.name ?? '') || x.id - y.id),
  };
}

function csvRow(e: StoredAuditEvent, lineNames: Map<number, string>): string {
  const line = e.productLineId === null ? '' : (lineNames.get(e.productLineId) ?? `product line ${e.productLineId}`);
  const entity = e.entityId === null ? e.entityType : `${e.entityType} ${e.entityId}`;
  // Before and after are the stored canonical JSON, byte for byte what the hash covers.
  return csvLine([e.id, e.occurredAt, e.actorEmail, e.action, entity, line, e.beforeJson, e.afterJson, e.hash]);
}

/**
 * The filtered trail as CSV lines (header first, newest event first), a batch
 * at a time so a long trail is never held in memory whole.
 */
export async function* auditCsv(filter: AuditFilter): AsyncGenerator<string> {
  yield csvLine(AUDIT_CSV_HEADER) + '\r\n';
  const names = new Map<number, string>();
  for await (const batch of auditRepository.scan(filter)) {
    const unknown = batch.map((e) => e.productLineId).filter((id): id is number => id !== null && !names.has(id));
    for (const [id, name] of await auditRepository.productLineNames(unknown)) names.set(id, name);
    yield batch.map((e) => csvRow(e, names)).join('\r\n') + '\r\n';
  }
}
