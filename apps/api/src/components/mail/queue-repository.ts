import { Op, type Transaction } from 'sequelize';

import { MailQueueModel, type MailStatus } from './model.js';

export interface QueuedMail {
  id: number;
  kind: string;
  to: string;
  subject: string;
  text: string;
  html: string | null;
  status: MailStatus;
  attempts: number;
  nextAttemptAt: string;
  lastError: string | null;
  messageId: string | null;
  sentAt: string | null;
  createdAt: string;
}

export interface NewMail {
  kind: string;
  to: string;
  subject: string;
  text: string;
  html: string | null;
}

function toRecord(row: MailQueueModel): QueuedMail {
  const m = row.get({ plain: true });
  return {
    id: m.id,
    kind: m.kind,
    to: m.toAddress,
    subject: m.subject,
    text: m.textBody,
    html: m.htmlBody,
    status: m.status,
    attempts: m.attempts,
    nextAttemptAt: new Date(m.nextAttemptAt).toISOString(),
    lastError: m.lastError,
    messageId: m.messageId,
    sentAt: m.sentAt ? new Date(m.sentAt).toISOString() : null,
    createdAt: new Date(m.createdAt).toISOString(),
  };
}

export const mailQueueRepository = {
  async add(mail: NewMail, transaction: Transaction): Promise<QueuedMail> {
    const row = await MailQueueModel.create(
      { kind: mail.kind, toAddress: mail.to, subject: mail.subject, textBody: mail.text, htmlBody: mail.html, nextAttemptAt: new Date(), lastError: null, messageId: null, sentAt: null },
      { transaction },
    );
    return toRecord(row);
  },

  async findById(id: number): Promise<QueuedMail | null> {
    const row = await MailQueueModel.findByPk(id);
    return row ? toRecord(row) : null;
  },

  async listDue(now: Date, limit: number): Promise<QueuedMail[]> {
    const rows = await MailQueueModel.findAll({
      where: { status: 'queued', nextAttemptAt: { [Op.lte]: now } },
      order: [['id', 'ASC']],
      limit,
    });
    return rows.map(toRecord);
  },

  /** Takes a queued row for sending; false when another worker took it first. */
  async claim(id: number): Promise<boolean> {
    const [count] = await MailQueueModel.update({ status: 'sending' }, { where: { id, status: 'queued' } });
    return count === 1;
  },

  async markSent(id: number, attempts: number, messageId: string | null, sentAt: Date): Promise<void> {
    await MailQueueModel.update({ status: 'sent', attempts, messageId, sentAt, lastError: null }, { where: { id } });
  },

  async markAttemptFailed(id: number, attempts: number, error: string, retryAt: Date | null): Promise<void> {
    await MailQueueModel.update(
      { status: retryAt ? 'queued' : 'failed', attempts, lastError: error.slice(0, 1000), ...(retryAt ? { nextAttemptAt: retryAt } : {}) },
      { where: { id } },
    );
  },

  /** Rows left in "sending" by a process that stopped mid-send go back in line. */
  async requeueStale(olderThan: Date): Promise<number> {
    const [count] = await MailQueueModel.update({ status: 'queued' }, { where: { status: 'sending', updatedAt: { [Op.lt]: olderThan } } });
    return count;
  },
};
