import type { ListResponse, OutboxMessage } from '@polecourt/contracts';

import { outboxRepository } from './outbox-repository.js';

/** What the local mail fake received, newest first. */
export function listOutbox(filter: { to?: string | undefined }, limit: number, offset: number): Promise<ListResponse<OutboxMessage>> {
  return outboxRepository.list(filter, limit, offset);
}
