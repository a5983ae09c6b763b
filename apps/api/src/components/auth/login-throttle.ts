import { QueryTypes, type Transaction } from 'sequelize';

import { getSequelize } from '../../lib/transaction.js';

export interface ThrottleSettings {
  maxPerAccount: number;
  maxPerAddress: number;
  windowMs: number;
}

export type ThrottleVerdict = { blocked: false } | { blocked: true; scope: 'account' | 'address'; retryAfterSeconds: number };

// Rows older than this are of no use to any window and are pruned as new failures come in.
const KEEP_MS = 24 * 3600 * 1000;

/**
 * When the n-th most recent open failure in the window ages out, fewer than
 * n remain: that moment is when sign-in opens again (null: not blocked now).
 */
async function reopensAt(column: 'email' | 'address', key: string, max: number, windowMs: number, now: Date): Promise<Date | null> {
  const rows = await getSequelize().query<{ failed_at: Date }>(
    `SELECT failed_at FROM login_failures WHERE ${column} = ? AND cleared_at IS NULL AND failed_at > ? ORDER BY failed_at DESC LIMIT 1 OFFSET ?`,
    { replacements: [key, new Date(now.getTime() - windowMs), max - 1], type: QueryTypes.SELECT },
  );
  const nth = rows[0];
  return nth ? new Date(new Date(nth.failed_at).getTime() + windowMs) : null;
}

export const loginThrottle = {
  async check(settings: ThrottleSettings, email: string, address: string, now = new Date()): Promise<ThrottleVerdict> {
    const [account, fromAddress] = await Promise.all([
      reopensAt('email', email, settings.maxPerAccount, settings.windowMs, now),
      reopensAt('address', address, settings.maxPerAddress, settings.windowMs, now),
    ]);
    const until = [account, fromAddress].filter((d): d is Date => d !== null).sort((a, b) => b.getTime() - a.getTime())[0];
    if (!until) return { blocked: false };
    return { blocked: true, scope: account && until === account ? 'account' : 'address', retryAfterSeconds: Math.max(1, Math.ceil((until.getTime() - now.getTime()) / 1000)) };
  },

  async recordFailure(email: string, address: string, transaction: Transaction, now = new Date()): Promise<void> {
    const sequelize = getSequelize();
    await sequelize.query('INSERT INTO login_failures (email, address, failed_at) VALUES (?, ?, ?)', { replacements: [email, address, now], transaction });
    await sequelize.query('DELETE FROM login_failures WHERE failed_at < ? LIMIT 100', { replacements: [new Date(now.getTime() - KEEP_MS)], transaction });
  },

  /** A good sign-in clears this account's failures only: other accounts' failures from the same address still count. */
  async clearAccount(email: string, transaction: Transaction, now = new Date()): Promise<void> {
    await getSequelize().query('UPDATE login_failures SET cleared_at = ? WHERE email = ? AND cleared_at IS NULL', { replacements: [now, email], transaction });
  },
};
