import type { OutboxMessage } from '@polecourt/contracts';

import { OutboxMessageModel } from './model.js';

export interface CapturedMail {
  to: string;
  from: string | null;
  subject: string;
  text: string;
  html: string | null;
  messageId: string | null;
  sentAt: Date;
}

function toMessage(row: OutboxMessageModel): OutboxMessage {
  const m = row.get({ plain: true });
  return {
    id: m.id,
    to: m.toAddress,
    subject: m.subject,
    text: m.textBody,
    html: m.htmlBody,
    messageId: m.messageId,
    sentAt: new Date(m.sentAt).toISOString(),
  };
}

export const outboxRepository = {
  async add(mail: CapturedMail): Promise<OutboxMessage> {
    const row = await OutboxMessageModel.create({
      toAddress: mail.to.slice(0, 1000),
      fromAddress: mail.from?.slice(0, 1000) ?? null,
      subject: mail.subject.slice(0, 1000),
      textBody: mail.text,
      htmlBody: mail.html,
      messageId: mail.messageId?.slice(0, 255) ?? null,
      sentAt: mail.sentAt,
    });
    return toMessage(row);
  },

  async list(filter: { to?: string | undefined }, limit: number, offset: number): Promise<{ items: OutboxMessage[]; total: number }> {
    const { rows, count } = await OutboxMessageModel.findAndCountAll({
      where: filter.to ? { toAddress: filter.to.toLowerCase() } : {},
      order: [['id', 'DESC']],
      limit,
      offset,
    });
    return { items: rows.map(toMessage), total: count };
  },
};
