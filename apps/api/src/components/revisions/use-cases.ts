import type { Transaction } from 'sequelize';

import type { RegionResponse, Revision, RevisionDiff, RevisionImpact, Viewport } from '@polecourt/contracts';

import { AppError } from '../../lib/app-error.js';
import { verifyPassword } from '../../lib/password.js';
import type { SessionUser } from '../../lib/request-context.js';
import { inTransaction } from '../../lib/transaction.js';
import { recordAudit } from '../audit/record-audit.js';
import { requirementSetRepository, type RequirementSetRecord } from '../requirement-sets/repository.js';
import { userRepository } from '../users/repository.js';
import { noticeRevisionApproved, noticeRevisionSubmitted } from '../workflow-notices/notices.js';
import { diffRequirements } from './diff.js';
import { acknowledgement, computeImpact } from './impact.js';
import { findRevisionKept } from './kept-revision.js';
import { regionResponse } from './region-response.js';
import { revisionRepository, toRevision, type RevisionRecord } from './repository.js';
import { requirementsSha256 } from './requirements-sha256.js';

const FROZEN_MESSAGE = 'This revision is approved or retired and can never change again. Write a new revision instead.';

// ---- steps ------------------------------------------------------------------

async function lockRevision(id: number, t: Transaction): Promise<RevisionRecord> {
  const revision = await revisionRepository.lock(id, t);
  if (!revision) throw AppError.notFound('That revision');
  return revision;
}

function found(revision: RevisionRecord | null): RevisionRecord {
  if (!revision) throw AppError.notFound('That revision');
  return revision;
}

async function findRevision(id: number): Promise<RevisionRecord> {
  return found(await revisionRepository.findById(id));
}

async function lockSetOf(revision: RevisionRecord, t: Transaction): Promise<RequirementSetRecord> {
  return (await requirementSetRepository.lock(revision.requirementSetId, t))!;
}

function assertNotFrozen(revision: RevisionRecord): void {
  if (revision.status === 'approved' || revision.status === 'retired') throw AppError.conflict('revision_frozen', FROZEN_MESSAGE);
}

function assertDraft(revision: RevisionRecord): void {
  assertNotFrozen(revision);
  if (revision.status !== 'draft') {
    throw AppError.conflict('not_draft', 'This revision is in review; only a draft can be edited or submitted.');
  }
}

function assertVersionMatches(revision: RevisionRecord, version: number): void {
  if (revision.version !== version) {
    throw AppError.conflict(
      'stale_version',
      `Someone else saved this revision first (you edited version ${version}, it is now at version ${revision.version}). Reload it and apply your changes again.`,
    );
  }
}

function assertAuthorOrAdmin(actor: SessionUser, revision: RevisionRecord): void {
  if (actor.role !== 'admin' && actor.id !== revision.authorId) {
    throw AppError.forbidden('Only the author of a revision (or an administrator) may submit it for review.');
  }
}

function assertNotAuthor(actor: SessionUser, revision: RevisionRecord): void {
  // Four eyes: a revision is approved by someone other than the person who wrote it.
  if (actor.id === revision.authorId) {
    throw new AppError('self_approval', 'You wrote this revision, so someone else has to approve it.', 403);
  }
}

async function assertPassword(actor: SessionUser, password: string): Promise<void> {
  const user = await userRepository.findById(actor.id);
  const ok = user?.passwordHash ? await verifyPassword(password, user.passwordHash) : false;
  // 400, not 401: to the client 401 means "signed out".
  if (!ok) throw AppError.badRequest('wrong_password', 'That password is not right; the approval was not signed.', { password: 'That password is not right' });
}

/**
 * What a revision is compared with: for a draft or one in review, the
 * approved revision it would replace; for an approved or retired one, the
 * revision it did replace (recorded at approval), if any.
 */
async function baselineFor(revision: RevisionRecord, t?: Transaction): Promise<RevisionRecord | null> {
  if (revision.status === 'approved' || revision.status === 'retired') {
    const replaced = revision.impact?.baselineRevisionId ?? null;
    return replaced === null ? null : revisionRepository.findById(replaced, t);
  }
  return revisionRepository.findApproved(revision.requirementSetId, t);
}

async function productLineOf(revision: RevisionRecord, t?: Transaction): Promise<number> {
  return (await requirementSetRepository.findById(revision.requirementSetId, t))!.productLineId;
}

// ---- use cases --------------------------------------------------------------

export async function getRevision(id: number): Promise<Revision> {
  return toRevision(await findRevision(id));
}

export async function createRevision(actor: SessionUser, setId: number, input: { requirements: Record<string, number>; rationale: string }): Promise<Revision> {
  return inTransaction(async (t) => {
    // The set's row lock hands out revision numbers one at a time.
    const set = await requirementSetRepository.lock(setId, t);
    if (!set) throw AppError.notFound('That requirement set');
    const number = await revisionRepository.nextNumber(setId, t);
    const revision = await revisionRepository.create({ requirementSetId: setId, number, requirements: input.requirements, rationale: input.rationale, authorId: actor.id }, t);
    await recordAudit(t, actor, { action: 'revision.create', entityType: 'revision', entityId: revision.id, productLineId: set.productLineId, after: revision });
    return toRevision(revision, t);
  });
}

export async function updateRevision(
  actor: SessionUser,
  id: number,
  input: { requirements?: Record<string, number> | undefined; rationale?: string | undefined; version: number },
): Promise<Revision> {
  return inTransaction(async (t) => {
    const before = await lockRevision(id, t);
    assertDraft(before);
    assertVersionMatches(before, input.version);
    const after = await revisionRepository.update(
      id,
      {
        ...(input.requirements !== undefined ? { requirements: input.requirements } : {}),
        ...(input.rationale !== undefined ? { rationale: input.rationale } : {}),
        version: before.version + 1,
      },
      t,
    );
    await recordAudit(t, actor, { action: 'revision.update', entityType: 'revision', entityId: id, productLineId: await productLineOf(before, t), before, after });
    return toRevision(after, t);
  });
}

export async function submitRevision(actor: SessionUser, id: number): Promise<Revision> {
  return inTransaction(async (t) => {
    const before = await lockRevision(id, t);
    assertDraft(before);
    assertAuthorOrAdmin(actor, before);
    const after = await revisionRepository.update(id, { status: 'in_review', submittedAt: new Date(), version: before.version + 1 }, t);
    await recordAudit(t, actor, { action: 'revision.submit', entityType: 'revision', entityId: id, productLineId: await productLineOf(before, t), before, after });
    await noticeRevisionSubmitted(t, actor, after);
    return toRevision(after, t);
  });
}

export async function approveRevision(actor: SessionUser, id: number, input: { password: string }): Promise<Revision> {
  // Checked before any lock: the password hash is deliberately slow.
  const early = await findRevision(id);
  assertNotAuthor(actor, early);
  await assertPassword(actor, input.password);
  return inTransaction(async (t) => {
    // Set first, then revision: two approvals in one set line up here.
    const set = await lockSetOf(early, t);
    const before = await lockRevision(id, t);
    assertNotFrozen(before);
    if (before.status !== 'in_review') throw AppError.conflict('not_in_review', 'Only a revision in review can be approved; submit it first.');
    const baseline = await revisionRepository.findApproved(set.id, t);
    const now = new Date();
    const impact = await computeImpact(before, set.productLineId, baseline, t);
    if (baseline) {
      const retired = await revisionRepository.update(baseline.id, { status: 'retired', retiredAt: now }, t);
      await recordAudit(t, actor, {
        action: 'revision.retire',
        entityType: 'revision',
        entityId: baseline.id,
        productLineId: set.productLineId,
        before: baseline,
        after: { ...retired, supersededBy: id },
      });
    }
    const after = await revisionRepository.update(
      id,
      {
        status: 'approved',
        approverId: actor.id,
        approvedAt: now,
        sha256: requirementsSha256(before.requirements),
        approvalMeaning: 'approved',
        impact: acknowledgement(impact, now),
        version: before.version + 1,
      },
      t,
    );
    await recordAudit(t, actor, { action: 'revision.approve', entityType: 'revision', entityId: id, productLineId: set.productLineId, before, after });
    // Told from the same impact the approver acknowledged.
    await noticeRevisionApproved(t, actor, after, impact);
    return toRevision(after, t);
  });
}

export async function retireRevision(actor: SessionUser, id: number): Promise<Revision> {
  return inTransaction(async (t) => {
    // Same lock order as approval (set, then revision), so the two never deadlock.
    const early = await findRevision(id);
    const set = await lockSetOf(early, t);
    const before = await lockRevision(id, t);
    if (before.status === 'retired') throw AppError.conflict('revision_frozen', 'This revision is already retired.');
    if (before.status !== 'approved') throw AppError.conflict('not_approved', 'Only an approved revision can be retired; a draft or a revision in review is simply left unapproved.');
    const after = await revisionRepository.update(id, { status: 'retired', retiredAt: new Date() }, t);
    await recordAudit(t, actor, { action: 'revision.retire', entityType: 'revision', entityId: id, productLineId: set.productLineId, before, after });
    return toRevision(after, t);
  });
}

export async function diffRevision(id: number, againstId: number | undefined): Promise<RevisionDiff> {
  const revision = await findRevision(id);
  let against: RevisionRecord | null;
  if (againstId !== undefined) {
    against = await revisionRepository.findById(againstId);
    if (!against) throw AppError.notFound('The revision to compare against');
  } else {
    against = await baselineFor(revision);
  }
  return { revisionId: id, againstRevisionId: against?.id ?? null, items: diffRequirements(against?.requirements ?? null, revision.requirements) };
}

export async function revisionRegion(id: number, given: Partial<Viewport>): Promise<RegionResponse> {
  return regionResponse(id, found(await findRevisionKept(id)).requirements, given);
}

export async function revisionImpact(id: number): Promise<RevisionImpact> {
  const revision = await findRevision(id);
  return computeImpact(revision, await productLineOf(revision), await baselineFor(revision));
}
