import LRUCache from 'lru-cache';
import type { Transaction } from 'sequelize';

import type { ListResponse, StoredAssessment } from '@polecourt/contracts';
import { ENGINE_VERSION, evaluate } from '@polecourt/spec';

import { AppError } from '../../lib/app-error.js';
import { parseWithEngine } from '../../lib/engine-input.js';
import { personOrUnknown, personRefs } from '../../lib/person-refs.js';
import type { SessionUser } from '../../lib/request-context.js';
import { GroupCommit } from '../../lib/group-commit.js';
import { inTransaction } from '../../lib/transaction.js';
import { recordAuditMany } from '../audit/record-audit.js';
import { candidateRepository, type CandidateRecord } from '../candidates/repository.js';
import { requirementSetRepository } from '../requirement-sets/repository.js';
import { findRevisionKept } from '../revisions/kept-revision.js';
import { revisionRepository, type RevisionRecord } from '../revisions/repository.js';
import { noticeAssessmentNotCompliant } from '../workflow-notices/notices.js';
import { assessmentRepository, type AssessmentRecord, type NewAssessment } from './repository.js';

async function toStored(records: AssessmentRecord[], t?: Transaction): Promise<StoredAssessment[]> {
  const people = await personRefs(records.map((r) => r.createdBy), t);
  return records.map((r) => ({
    id: r.id,
    candidateId: r.candidateId,
    revisionId: r.revisionId,
    revisionSha256: r.revisionSha256,
    engineVersion: r.engineVersion,
    createdAt: r.createdAt,
    createdBy: personOrUnknown(people, r.createdBy) ?? { id: 0, name: 'Unknown user', email: '' },
    revisionStatus: r.revisionStatus,
    result: r.result,
  }));
}

// ---- steps ------------------------------------------------------------------

// Reads kept for the pipelines that assess the same candidates again and
// again: candidates and requirement sets are never changed once created (no
// route edits them). Revisions come from revisions/kept-revision.ts; their
// status is checked again under a lock in storeAssessments.
const candidates = new LRUCache<number, CandidateRecord>({ max: 5_000 });
const lineOfSet = new LRUCache<number, number>({ max: 5_000 });

async function findCandidate(id: number): Promise<CandidateRecord> {
  const kept = candidates.get(id);
  if (kept) return kept;
  const candidate = await candidateRepository.findById(id);
  if (!candidate) throw AppError.notFound('That candidate');
  candidates.set(id, candidate);
  return candidate;
}

async function findRevisionInLine(revisionId: number, productLineId: number): Promise<RevisionRecord | null> {
  const revision = await findRevisionKept(revisionId);
  if (!revision) return null;
  let line = lineOfSet.get(revision.requirementSetId);
  if (line === undefined) {
    const set = await requirementSetRepository.findById(revision.requirementSetId);
    if (!set) return null;
    line = set.productLineId;
    lineOfSet.set(set.id, line);
  }
  return line === productLineId ? revision : null;
}

/** The revision named, or the line's only approved one; it must be of the candidate's product line. */
async function pickRevision(candidate: CandidateRecord, revisionId: number | undefined): Promise<RevisionRecord> {
  if (revisionId !== undefined) {
    const revision = await findRevisionInLine(revisionId, candidate.productLineId);
    if (!revision) {
      throw AppError.badRequest('invalid_input', 'That revision is not one of this product line’s requirement sets.', { revisionId: 'not a revision of this product line' });
    }
    return revision;
  }
  const sets = await requirementSetRepository.listAllByLine(candidate.productLineId);
  const approved = await revisionRepository.findApprovedInSets(sets.map((s) => s.id));
  if (approved.length === 0) {
    throw AppError.badRequest('no_approved_revision', 'This product line has no approved requirement revision yet, so there is nothing to assess against.', {
      revisionId: 'no approved revision to assess against',
    });
  }
  if (approved.length > 1) {
    throw AppError.badRequest('revision_required', 'This product line has several approved revisions (one per requirement set); say which one to assess against.', {
      revisionId: `pick one of ${approved.map((r) => r.id).join(', ')}`,
    });
  }
  return approved[0]!;
}

function assertApproved(revision: RevisionRecord): void {
  if (revision.status === 'approved') return;
  if (revision.status === 'retired') {
    throw AppError.conflict('revision_retired', 'That revision is retired; assess against the approved revision in force.');
  }
  throw AppError.conflict(
    'revision_not_approved',
    'Only an approved revision can be assessed against for the record; a draft or a revision in review is previewed on its revision impact page instead.',
  );
}

// ---- use cases --------------------------------------------------------------

interface AssessmentJob {
  actor: SessionUser;
  candidate: CandidateRecord;
  revisionId: number;
  /** The engine's verdict on the revision's requirements, frozen since approval, so worked out before the transaction. */
  result: ReturnType<typeof evaluate>;
}

// Assessments under load are stored by group commit: those requested while a
// transaction is under way go together in the next, one lock of the audit
// chain for all of them, each answered on its own.
const assessmentWrites = new GroupCommit<AssessmentJob, StoredAssessment>(storeAssessments, inTransaction);

async function storeAssessments(jobs: AssessmentJob[], t: Transaction): Promise<(StoredAssessment | Error)[]> {
  // A shared lock on each revision: it cannot be retired while these assessments are stored.
  const revisions = new Map<number, RevisionRecord>();
  for (const id of new Set(jobs.map((j) => j.revisionId))) revisions.set(id, (await revisionRepository.lockShared(id, t))!);
  const outcomes: (StoredAssessment | Error)[] = new Array(jobs.length);
  const accepted: { index: number; job: AssessmentJob; revision: RevisionRecord; stored: NewAssessment & { createdAt: Date } }[] = [];
  jobs.forEach((job, index) => {
    const revision = revisions.get(job.revisionId)!;
    try {
      assertApproved(revision);
    } catch (e) {
      outcomes[index] = e as Error;
      return;
    }
    const { actor, candidate, result } = job;
    const stored = {
      candidateId: candidate.id,
      revisionId: revision.id,
      revisionSha256: revision.sha256!,
      engineVersion: result.engineVersion ?? ENGINE_VERSION,
      verdict: result.verdict ?? 'noncompliant',
      result,
      createdBy: actor.id,
      createdAt: new Date(),
    };
    accepted.push({ index, job, revision, stored });
  });
  // One insert for the whole batch.
  const ids = await assessmentRepository.createMany(accepted.map((a) => a.stored), t);
  const events: Parameters<typeof recordAuditMany>[1] = [];
  const notices: { assessmentId: number; job: AssessmentJob; revision: RevisionRecord }[] = [];
  accepted.forEach(({ index, job, revision, stored }, k) => {
    const id = ids[k]!;
    const { actor, candidate, result } = job;
    const { createdAt, ...recorded } = stored;
    events.push({ actor, event: { action: 'assessment.create', entityType: 'assessment', entityId: id, productLineId: candidate.productLineId, after: { id, ...recorded } } });
    if (stored.verdict === 'noncompliant') notices.push({ assessmentId: id, job, revision });
    // What was just written, as getAssessment would read it back, without reading it back.
    outcomes[index] = {
      id,
      candidateId: candidate.id,
      revisionId: revision.id,
      revisionSha256: stored.revisionSha256,
      engineVersion: stored.engineVersion,
      createdAt: createdAt.toISOString(),
      createdBy: { id: actor.id, name: actor.name, email: actor.email },
      revisionStatus: revision.status,
      result: result as unknown as StoredAssessment['result'],
    };
  });
  await recordAuditMany(t, events);
  for (const n of notices) {
    await noticeAssessmentNotCompliant(t, { assessmentId: n.assessmentId, candidate: n.job.candidate, revision: n.revision, result: n.job.result });
  }
  return outcomes;
}

export async function createAssessment(actor: SessionUser, candidateId: number, input: { revisionId?: number | undefined }): Promise<StoredAssessment> {
  const candidate = await findCandidate(candidateId);
  const picked = await pickRevision(candidate, input.revisionId);
  assertApproved(picked);
  const result = parseWithEngine('design', () => evaluate(candidate.design, picked.requirements));
  return assessmentWrites.submit({ actor, candidate, revisionId: picked.id, result });
}

export async function getAssessment(id: number): Promise<StoredAssessment> {
  const record = await assessmentRepository.findById(id);
  if (!record) throw AppError.notFound('That assessment');
  return (await toStored([record]))[0]!;
}

export async function listAssessments(candidateId: number, limit: number, offset: number): Promise<ListResponse<StoredAssessment>> {
  await findCandidate(candidateId);
  const { items, total } = await assessmentRepository.listByCandidate(candidateId, limit, offset);
  return { items: await toStored(items), total };
}
