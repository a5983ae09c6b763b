// Reading what the app sent: the outbox (what the local mail fake received,
// parsed) and the mail_queue rows behind it.
import { QueryTypes, type Sequelize } from 'sequelize';

import type { OutboxMessage } from '@polecourt/contracts';

import type { TestClient } from './client.js';

/** Waits (polling, bounded) until the outbox holds `count` messages for this address; returns them newest first. */
export async function waitForMail(admin: TestClient, to: string, count = 1, timeoutMs = 15_000): Promise<OutboxMessage[]> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const r = await admin.get(`/api/outbox?to=${encodeURIComponent(to)}&limit=50`);
    if (r.status !== 200) throw new Error(`GET /api/outbox answered ${r.status}: ${JSON.stringify(r.body)}`);
    if (r.body.items.length >= count) return r.body.items as OutboxMessage[];
    if (Date.now() > deadline) throw new Error(`no ${count} message(s) for ${to} in the outbox after ${timeoutMs} ms (found ${r.body.items.length})`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

export interface QueueRow {
  id: number;
  kind: string;
  status: string;
  attempts: number;
  last_error: string | null;
  to_address: string;
  subject: string;
}

export function queueRowsFor(sequelize: Sequelize, to: string): Promise<QueueRow[]> {
  return sequelize.query<QueueRow>('SELECT id, kind, status, attempts, last_error, to_address, subject FROM mail_queue WHERE to_address = ? ORDER BY id', {
    replacements: [to.toLowerCase()],
    type: QueryTypes.SELECT,
  });
}

/** Waits (polling, bounded) until the queue row matches `done`. */
export async function waitForQueueRow(sequelize: Sequelize, to: string, done: (row: QueueRow) => boolean, timeoutMs = 20_000): Promise<QueueRow> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const rows = await queueRowsFor(sequelize, to);
    const row = rows.find(done);
    if (row) return row;
    if (Date.now() > deadline) throw new Error(`queue row for ${to} did not reach the expected state: ${JSON.stringify(rows)}`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

/** The one-time link in a message, and its token. */
export function setPasswordLink(message: Pick<OutboxMessage, 'text'>): { url: URL; token: string } {
  const match = /(https?:\/\/\S+\/set-password\?token=[A-Za-z0-9_%-]+)/.exec(message.text);
  if (!match?.[1]) throw new Error(`no set-password link in:\n${message.text}`);
  const url = new URL(match[1]);
  return { url, token: url.searchParams.get('token') ?? '' };
}
