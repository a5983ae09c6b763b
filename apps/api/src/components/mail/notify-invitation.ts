import type { Transaction } from 'sequelize';

import { enqueueMail } from './enqueue-mail.js';
import { action, formatUtc, note, paragraph, renderMail, type Recipient } from './layout.js';
import { absoluteLink } from './mail-settings.js';
import type { QueuedMail } from './queue-repository.js';

export interface InvitationInput {
  to: Recipient;
  roleLabel: string;
  invitedByName: string;
  /** The one-time link, absolute or a path such as "/set-password?token=...". */
  link: string;
  expiresAt: Date;
}

/** Queues the invitation with its one-time link to set a password. */
export function notifyInvitation(t: Transaction, input: InvitationInput): Promise<QueuedMail> {
  const url = absoluteLink(input.link);
  const body = renderMail(`Hello ${input.to.name},`, [
    paragraph(`${input.invitedByName} has opened a Polecourt account for you (${input.to.email}) with the role ${input.roleLabel}.`),
    paragraph('Choose your password to start using it.'),
    action('Set your password', url),
    note(`The link works once and until ${formatUtc(input.expiresAt)}. If it has run out, ask your administrator to send a new invitation.`),
    note('If you did not expect this message, you can ignore it; nothing happens until the link is used.'),
  ]);
  return enqueueMail(t, { kind: 'invitation', to: input.to.email, subject: 'Your Polecourt account: set your password', ...body });
}
