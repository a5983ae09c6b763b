import type { Transaction } from 'sequelize';

import { enqueueMail } from './enqueue-mail.js';
import { action, formatUtc, note, paragraph, renderMail, type Recipient } from './layout.js';
import { absoluteLink } from './mail-settings.js';
import type { QueuedMail } from './queue-repository.js';

export interface PasswordResetInput {
  to: Recipient;
  /** The one-time link, absolute or a path such as "/set-password?token=...". */
  link: string;
  expiresAt: Date;
}

/** Queues the password-reset message with its one-time link. */
export function notifyPasswordReset(t: Transaction, input: PasswordResetInput): Promise<QueuedMail> {
  const url = absoluteLink(input.link);
  const body = renderMail(`Hello ${input.to.name},`, [
    paragraph(`Someone asked to reset the Polecourt password for ${input.to.email}. If that was you, choose a new password here:`),
    action('Choose a new password', url),
    note(`The link works once and until ${formatUtc(input.expiresAt)}.`),
    note('If you did not ask for this, ignore this message: your password stays as it is.'),
  ]);
  return enqueueMail(t, { kind: 'password_reset', to: input.to.email, subject: 'Reset your Polecourt password', ...body });
}
