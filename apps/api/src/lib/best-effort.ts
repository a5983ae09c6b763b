import type { Transaction } from 'sequelize';

import { logger } from './logger.js';
import { getSequelize } from './transaction.js';

let counter = 0;

/**
 * Runs side work (queueing notices) inside the caller's transaction behind a
 * savepoint: what it writes lands with the caller's write, but if it fails its
 * writes are rolled back to the savepoint, the failure is logged and the
 * caller's write goes on. If even the rollback fails, the transaction itself
 * is broken (connection lost, deadlock) and the original error is rethrown.
 */
export async function bestEffort<T>(t: Transaction, what: string, work: () => Promise<T>): Promise<T | null> {
  counter = (counter + 1) % 1_000_000;
  const name = `best_effort_${counter}`;
  const sequelize = getSequelize();
  await sequelize.query(`SAVEPOINT ${name}`, { transaction: t });
  try {
    const result = await work();
    await sequelize.query(`RELEASE SAVEPOINT ${name}`, { transaction: t });
    return result;
  } catch (err) {
    try {
      await sequelize.query(`ROLLBACK TO SAVEPOINT ${name}`, { transaction: t });
    } catch {
      throw err;
    }
    logger.error(`${what} failed; the change itself was saved`, err);
    return null;
  }
}
