// The workflow's e-mail notices: who is told, with what. Each runs inside the
// caller's transaction (a notice exists if and only if its cause was saved)
// behind a savepoint, so a notice that cannot be queued never undoes the
// write that caused it.
import type { Transaction } from 'sequelize';

import type { RevisionImpact } from '@polecourt/contracts';
import type { Assessment, Check } from '@polecourt/spec';

import { bestEffort } from '../../lib/best-effort.js';
import type { SessionUser } from '../../lib/request-context.js';
import type { Recipient } from '../mail/layout.js';
import { notifyAssessmentNotCompliant } from '../mail/notify-assessment-not-compliant.js';
import { notifyRevisionApproved, type Verdict, type VerdictChange } from '../mail/notify-revision-approved.js';
import { notifyRevisionSubmitted } from '../mail/notify-revision-submitted.js';
import type { RevisionRecord } from '../revisions/repository.js';
import { failedLimitLines } from './failed-limits.js';
import { noticeRepository, type Person, type SetContext } from './repository.js';

// Paths of the web client's pages (apps/web/src/app/router.tsx); mail-settings makes them absolute.
export const revisionLink = (revisionId: number): string => `/revisions/${revisionId}`;
export const candidateLink = (candidateId: number): string => `/candidates/${candidateId}`;
export const assessmentLink = (assessmentId: number): string => `/assessments/${assessmentId}`;

const recipient = (p: Person): Recipient => ({ email: p.email, name: p.name });
const sameEmail = (a: string, b: string): boolean => a.trim().toLowerCase() === b.trim().toLowerCase();

async function contextOf(revision: RevisionRecord, t: Transaction): Promise<SetContext> {
  const ctx = await noticeRepository.setContext(revision.requirementSetId, t);
  if (!ctx) throw new Error(`requirement set ${revision.requirementSetId} of revision ${revision.id} is missing`);
  return ctx;
}

/**
 * "Review requested" to the product line's engineers who may approve it
 * (systems engineers and administrators who have worked on the line), except
 * its author (who may not approve it) and the person who submitted it. When
 * nobody else has worked on the line yet, the administrators are asked: they
 * can approve any revision or hand it to a colleague.
 */
export function noticeRevisionSubmitted(t: Transaction, actor: SessionUser, revision: RevisionRecord): Promise<unknown> {
  return bestEffort(t, `the review notice for revision ${revision.id}`, async () => {
    const ctx = await contextOf(revision, t);
    const eligible = (p: Person) => p.id !== actor.id && p.id !== revision.authorId;
    const engineers = await noticeRepository.engineersOfLine(ctx.productLineId, t);
    let reviewers: Person[] = engineers.filter((p) => (p.role === 'systems_engineer' || p.role === 'admin') && eligible(p));
    if (reviewers.length === 0) reviewers = (await noticeRepository.activeByRoles(['admin'], t)).filter(eligible);
    return notifyRevisionSubmitted(t, {
      productLineName: ctx.productLineName,
      requirementSetName: ctx.requirementSetName,
      revisionNumber: revision.number,
      authorName: actor.name,
      link: revisionLink(revision.id),
      recipients: reviewers.map(recipient),
    });
  });
}

const VERDICTS: Record<string, Verdict> = { compliant: 'compliant', noncompliant: 'not_compliant' };

/**
 * "Approved" to the product line's engineers (everyone who has worked on the
 * line, the approver aside), and to each owner of a candidate whose verdict
 * the approval flips, from the impact computed at approval. An outcome the engine could not compute (a stored
 * design it rejects) is no verdict: as "before" it reads as not assessed, as
 * "after" the row is left out of the message.
 */
export function noticeRevisionApproved(
  t: Transaction,
  actor: SessionUser,
  revision: RevisionRecord,
  impact: RevisionImpact,
): Promise<unknown> {
  return bestEffort(t, `the approval notice for revision ${revision.id}`, async () => {
    const ctx = await contextOf(revision, t);
    const changed = impact.items.filter((r) => r.changed && !('error' in r.proposed));
    const owners = await noticeRepository.ownersOf(changed.map((r) => r.candidateId), t);
    const verdictChanges: VerdictChange[] = [];
    for (const row of changed) {
      const owner = owners.get(row.candidateId);
      const after = 'verdict' in row.proposed ? VERDICTS[row.proposed.verdict] : undefined;
      if (!owner || !after) continue;
      const before = row.current && 'verdict' in row.current ? (VERDICTS[row.current.verdict] ?? null) : null;
      verdictChanges.push({ candidateName: row.name, owner: recipient(owner), before, after, link: candidateLink(row.candidateId) });
    }
    const engineers = (await noticeRepository.engineersOfLine(ctx.productLineId, t)).filter((p) => !sameEmail(p.email, actor.email)).map(recipient);
    return notifyRevisionApproved(t, {
      productLineName: ctx.productLineName,
      requirementSetName: ctx.requirementSetName,
      revisionNumber: revision.number,
      approverName: actor.name,
      ...(revision.sha256 ? { sha256: revision.sha256 } : {}),
      link: revisionLink(revision.id),
      engineers,
      verdictChanges,
    });
  });
}

/** "Not compliant" to the person who submitted the candidate. */
export function noticeAssessmentNotCompliant(
  t: Transaction,
  input: { assessmentId: number; candidate: { id: number; name: string; createdBy: number | null }; revision: RevisionRecord; result: Assessment },
): Promise<unknown> {
  return bestEffort(t, `the not-compliant notice for assessment ${input.assessmentId}`, async () => {
    const { candidate, revision, result } = input;
    const owner = (await noticeRepository.ownersOf([candidate.id], t)).get(candidate.id);
    if (!owner) return null; // no active submitter to tell
    const ctx = await contextOf(revision, t);
    return notifyAssessmentNotCompliant(t, {
      to: recipient(owner),
      candidateName: candidate.name,
      productLineName: ctx.productLineName,
      requirementSetName: ctx.requirementSetName,
      revisionNumber: revision.number,
      failedLimits: failedLimitLines(result.checks as Check[], result.metrics?.settlingBandPct ?? revision.requirements.settlingBandPct ?? null),
      link: assessmentLink(input.assessmentId),
    });
  });
}
