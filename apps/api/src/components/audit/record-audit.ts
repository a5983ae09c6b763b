import type { Transaction } from 'sequelize';

import type { SessionUser } from '../../lib/request-context.js';
import { auditRepository, type AuditEventInput } from './repository.js';

/** What every use case calls after a write, inside the same transaction. */
export function recordAudit(
  transaction: Transaction,
  actor: SessionUser | null,
  event: Omit<AuditEventInput, 'actor'>,
): Promise<unknown> {
  return recordAuditMany(transaction, [{ actor, event }]);
}

/** Several events of writes that commit together (a group commit), in order, under one lock of the chain's head. */
export function recordAuditMany(transaction: Transaction, events: { actor: SessionUser | null; event: Omit<AuditEventInput, 'actor'> }[]): Promise<unknown> {
  return auditRepository.appendMany(
    events.map(({ actor, event }) => ({ ...event, actor: actor ? { id: actor.id, email: actor.email } : null })),
    transaction,
  );
}
