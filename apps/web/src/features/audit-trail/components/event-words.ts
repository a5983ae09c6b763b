import type { AuditEvent } from '@polecourt/contracts';

const ENTITY_WORDS: Record<string, string> = {
  api_token: 'API token',
  assessment: 'Assessment',
  candidate: 'Candidate',
  product_line: 'Product line',
  report: 'Compliance report',
  requirement_set: 'Requirement set',
  revision: 'Revision',
  user: 'User',
};

/** "revision" -> "Revision"; an entity type this client does not know keeps its own name, readably. */
export function entityWord(entityType: string): string {
  return ENTITY_WORDS[entityType] ?? entityType.replace(/_/g, ' ').replace(/^./, (c) => c.toUpperCase());
}

export function entityLabel(e: Pick<AuditEvent, 'entityType' | 'entityId'>): string {
  return e.entityId === null ? entityWord(e.entityType) : `${entityWord(e.entityType)} ${e.entityId}`;
}

/** The stored time in UTC, to the second, as the trail records it. */
export function utcTime(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : `${d.toISOString().slice(0, 19).replace('T', ' ')} UTC`;
}

export function shortHash(hash: string): string {
  return hash.length > 16 ? `${hash.slice(0, 12)}…` : hash;
}
