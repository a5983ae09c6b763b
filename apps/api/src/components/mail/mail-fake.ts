import type { AddressInfo } from 'node:net';

import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

import { logger } from '../../lib/logger.js';
import { outboxRepository } from './outbox-repository.js';

export interface MailFake {
  host: string;
  port: number;
  close(): Promise<void>;
}

const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

/**
 * The local stand-in for a hosted mail service: an SMTP server on loopback
 * that accepts every message, parses it and stores it in outbox_messages,
 * where admins read it (GET /api/outbox). Port 0 picks a free port.
 */
export async function startMailFake(port: number, host = '127.0.0.1'): Promise<MailFake> {
  const server = new SMTPServer({
    // Loopback only and nothing is relayed: no TLS or sign-in to negotiate.
    disabledCommands: ['STARTTLS', 'AUTH'],
    authOptional: true,
    banner: 'Polecourt local mail fake',
    size: MAX_MESSAGE_BYTES,
    closeTimeout: 2000,
    // Loopback senders only: a reverse DNS lookup would only add delay.
    disableReverseLookup: true,
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const to = session.envelope.rcptTo.map((r) => r.address.toLowerCase()).join(', ');
          const from = session.envelope.mailFrom ? session.envelope.mailFrom.address : null;
          await outboxRepository.add({
            to,
            from,
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
            messageId: parsed.messageId ?? null,
            sentAt: new Date(),
          });
          callback();
        })
        .catch((err: unknown) => {
          // The sender sees a temporary failure and tries again later.
          logger.error('mail fake could not store a message', err);
          callback(Object.assign(new Error('Could not store the message; try again later'), { responseCode: 451 }));
        });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      resolve();
    });
  });
  server.on('error', (err) => logger.error('mail fake error', err));
  const bound = (server.server.address() as AddressInfo).port;
  return {
    host,
    port: bound,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
