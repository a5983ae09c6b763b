import type { Transaction } from 'sequelize';

import { mailQueueRepository, type NewMail, type QueuedMail } from './queue-repository.js';
import { kickMailWorker } from './worker-registry.js';

/**
 * Puts one message in the queue inside the caller's transaction, so it exists
 * if and only if its cause was saved. The worker is nudged after the commit;
 * sending never happens inside a request.
 */
export async function enqueueMail(transaction: Transaction, mail: NewMail): Promise<QueuedMail> {
  const queued = await mailQueueRepository.add({ ...mail, to: mail.to.trim().toLowerCase() }, transaction);
  transaction.afterCommit(() => kickMailWorker());
  return queued;
}
