import type { Transaction } from 'sequelize';

import { enqueueMail } from './enqueue-mail.js';
import { action, note, paragraph, renderMail, uniqueRecipients, type Recipient } from './layout.js';
import { absoluteLink } from './mail-settings.js';
import type { QueuedMail } from './queue-repository.js';

export interface RevisionSubmittedInput {
  productLineName: string;
  requirementSetName: string;
  revisionNumber: number;
  authorName: string;
  /** The revision's page, absolute or a path. */
  link: string;
  /** Systems engineers who may review it; the author is left out by the caller or here by e-mail. */
  recipients: Recipient[];
  authorEmail?: string;
}

/** Queues one "review requested" message per systems engineer. */
export async function notifyRevisionSubmitted(t: Transaction, input: RevisionSubmittedInput): Promise<QueuedMail[]> {
  const url = absoluteLink(input.link);
  const author = input.authorEmail?.trim().toLowerCase();
  const subject = `Review requested: ${input.requirementSetName}, revision ${input.revisionNumber}`;
  const queued: QueuedMail[] = [];
  for (const to of uniqueRecipients(input.recipients)) {
    if (to.email === author) continue;
    const body = renderMail(`Hello ${to.name},`, [
      paragraph(
        `${input.authorName} has submitted revision ${input.revisionNumber} of the requirement set "${input.requirementSetName}" ` +
          `(product line ${input.productLineName}) for review.`,
      ),
      action('Review the revision', url),
      note('An approved revision never changes again, and it must be approved by someone other than its author.'),
    ]);
    queued.push(await enqueueMail(t, { kind: 'revision_submitted', to: to.email, subject, ...body }));
  }
  return queued;
}
