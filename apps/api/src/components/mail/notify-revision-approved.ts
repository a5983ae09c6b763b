import type { Transaction } from 'sequelize';

import { enqueueMail } from './enqueue-mail.js';
import { action, list, note, paragraph, renderMail, uniqueRecipients, type Recipient } from './layout.js';
import { absoluteLink } from './mail-settings.js';
import type { QueuedMail } from './queue-repository.js';

export type Verdict = 'compliant' | 'not_compliant';

export interface VerdictChange {
  candidateName: string;
  owner: Recipient;
  /** Verdict against the revision this one replaces; null when there was none. */
  before: Verdict | null;
  after: Verdict;
  /** The candidate's page, absolute or a path. */
  link?: string;
}

export interface RevisionApprovedInput {
  productLineName: string;
  requirementSetName: string;
  revisionNumber: number;
  approverName: string;
  /** The content SHA-256 the revision got at approval. */
  sha256?: string;
  /** The revision's page, absolute or a path. */
  link: string;
  /** The product line's engineers. */
  engineers: Recipient[];
  /** Candidates whose verdict this revision flips; each owner hears about theirs. */
  verdictChanges: VerdictChange[];
}

const VERDICT_WORDS: Record<Verdict, string> = { compliant: 'compliant', not_compliant: 'not compliant' };

function changeLine(c: VerdictChange): string {
  const before = c.before ? VERDICT_WORDS[c.before] : 'not assessed';
  const where = c.link ? ` (${absoluteLink(c.link)})` : '';
  return `${c.candidateName}: ${before} -> ${VERDICT_WORDS[c.after]}${where}`;
}

/**
 * Queues "revision approved" messages: candidate owners get one listing their
 * candidates whose verdict flips; the product line's other engineers get the
 * plain notice. Nobody gets two.
 */
export async function notifyRevisionApproved(t: Transaction, input: RevisionApprovedInput): Promise<QueuedMail[]> {
  const url = absoluteLink(input.link);
  const title = `revision ${input.revisionNumber} of the requirement set "${input.requirementSetName}" (product line ${input.productLineName})`;
  const subject = `Approved: ${input.requirementSetName}, revision ${input.revisionNumber}`;
  const fingerprint = input.sha256 ? [note(`Content SHA-256: ${input.sha256}`)] : [];

  const byOwner = new Map<string, { owner: Recipient; changes: VerdictChange[] }>();
  for (const c of input.verdictChanges) {
    const key = c.owner.email.trim().toLowerCase();
    const entry = byOwner.get(key) ?? { owner: { email: key, name: c.owner.name }, changes: [] };
    entry.changes.push(c);
    byOwner.set(key, entry);
  }

  const queued: QueuedMail[] = [];
  for (const { owner, changes } of byOwner.values()) {
    const body = renderMail(`Hello ${owner.name},`, [
      paragraph(`${input.approverName} has approved ${title}.`),
      paragraph(changes.length === 1 ? 'It changes the verdict of your candidate:' : `It changes the verdict of ${changes.length} of your candidates:`),
      list(changes.map(changeLine)),
      action('Open the revision', url),
      ...fingerprint,
    ]);
    queued.push(await enqueueMail(t, { kind: 'revision_approved', to: owner.email, subject: `${subject} (verdict changed)`, ...body }));
  }
  for (const to of uniqueRecipients(input.engineers)) {
    if (byOwner.has(to.email)) continue;
    const body = renderMail(`Hello ${to.name},`, [
      paragraph(`${input.approverName} has approved ${title}. It is now the revision candidates are assessed against.`),
      action('Open the revision', url),
      ...fingerprint,
    ]);
    queued.push(await enqueueMail(t, { kind: 'revision_approved', to: to.email, subject, ...body }));
  }
  return queued;
}
