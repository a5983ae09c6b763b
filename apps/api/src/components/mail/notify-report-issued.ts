import type { Transaction } from 'sequelize';

import { enqueueMail } from './enqueue-mail.js';
import { action, note, paragraph, renderMail, uniqueRecipients, type Recipient } from './layout.js';
import { absoluteLink } from './mail-settings.js';
import type { QueuedMail } from './queue-repository.js';

export interface ReportIssuedInput {
  reportNumber: string;
  /** The stated meaning of the signature, e.g. "reviewed" or "released". */
  meaning: string;
  signerName: string;
  candidateName: string;
  productLineName: string;
  requirementSetName: string;
  revisionNumber: number;
  verdict: 'compliant' | 'not_compliant';
  /** SHA-256 of the signed PDF. */
  sha256: string;
  /** The report's page, absolute or a path. */
  link: string;
  /** The auditors. */
  recipients: Recipient[];
}

/** Queues one "compliance report issued" message per auditor. */
export async function notifyReportIssued(t: Transaction, input: ReportIssuedInput): Promise<QueuedMail[]> {
  const url = absoluteLink(input.link);
  const verdict = input.verdict === 'compliant' ? 'compliant' : 'not compliant';
  const subject = `Compliance report ${input.reportNumber} issued: ${input.candidateName}`;
  const queued: QueuedMail[] = [];
  for (const to of uniqueRecipients(input.recipients)) {
    const body = renderMail(`Hello ${to.name},`, [
      paragraph(
        `${input.signerName} has signed compliance report ${input.reportNumber} with the meaning "${input.meaning}". ` +
          `It covers the candidate "${input.candidateName}" assessed against revision ${input.revisionNumber} of ` +
          `"${input.requirementSetName}" (product line ${input.productLineName}); verdict: ${verdict}.`,
      ),
      action('Open the report', url),
      note(`SHA-256 of the signed PDF: ${input.sha256}. Verify a downloaded copy in Polecourt before filing it.`),
      note(
        'Compliance of a linear closed-loop model with transient limits is not a safety case; the report says what else must be checked on hardware.',
      ),
    ]);
    queued.push(await enqueueMail(t, { kind: 'report_issued', to: to.email, subject, ...body }));
  }
  return queued;
}
