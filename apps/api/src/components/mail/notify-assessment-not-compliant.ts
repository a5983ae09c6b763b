import type { Transaction } from 'sequelize';

import { enqueueMail } from './enqueue-mail.js';
import { action, list, paragraph, renderMail, type Recipient } from './layout.js';
import { absoluteLink } from './mail-settings.js';
import type { QueuedMail } from './queue-repository.js';

export interface AssessmentNotCompliantInput {
  to: Recipient;
  candidateName: string;
  productLineName: string;
  requirementSetName: string;
  revisionNumber: number;
  /** Plain lines naming each limit missed, e.g. "settling time 0.41 s, limit 0.30 s". */
  failedLimits: string[];
  /** The assessment's page, absolute or a path. */
  link: string;
}

/** Queues the "not compliant" message to the person who submitted the candidate. */
export function notifyAssessmentNotCompliant(t: Transaction, input: AssessmentNotCompliantInput): Promise<QueuedMail> {
  const url = absoluteLink(input.link);
  const body = renderMail(`Hello ${input.to.name},`, [
    paragraph(
      `The assessment of your candidate "${input.candidateName}" against revision ${input.revisionNumber} of ` +
        `"${input.requirementSetName}" (product line ${input.productLineName}) has the verdict: not compliant.`,
    ),
    ...(input.failedLimits.length ? [paragraph('Limits not met:'), list(input.failedLimits)] : []),
    action('Open the assessment', url),
  ]);
  return enqueueMail(t, {
    kind: 'assessment_not_compliant',
    to: input.to.email,
    subject: `Not compliant: ${input.candidateName} against ${input.requirementSetName}, revision ${input.revisionNumber}`,
    ...body,
  });
}
