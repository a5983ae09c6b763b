import type { Transaction } from 'sequelize';

import type { ListResponse, StoredAssessment } from '@polecourt/contracts';
import { ENGINE_VERSION, evaluate } from '@polecourt/spec';

import { AppError } from '../../lib/app-error.js';
import { parseWithEngine } from '../../lib/engine-input.js';
import { personOrUnknown, personRefs } from '../../lib/person-refs.js';
import type { SessionUser } from '../../lib/request-context.js';
import { inTransaction } from '../../lib/transaction.js';
import { recordAudit } from '../audit/record-audit.js';
import { candidateRepository, type CandidateRecord } from '../candidates/repository.js';
import { requirementSetRepository } from '../requirement-sets/repository.js';
import { revisionRepository, type RevisionRecord } from '../revisions/repository.js';
import { RevisionModel } from '../revisions/model.js';
import { noticeAssessmentNotCompliant } from '../workflow-notices/notices.js';
import { assessmentRepository, type AssessmentRecord } from './repository.js';

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

async function findCandidate(id: number): Promise<CandidateRecord> {
  const candidate = await candidateRepository.findById(id);
  if (!candidate) throw AppError.notFound('That candidate');
  return candidate;
}

/** The revision named, or the line's only approved one; it must be of the candidate's product line. */
async function pickRevision(candidate: CandidateRecord, revisionId: number | undefined): Promise<RevisionRecord> {
  const sets = await requirementSetRepository.listAllByLine(candidate.productLineId);
  if (revisionId !== undefined) {
    const revision = await revisionRepository.findById(revisionId);
    if (!revision || !sets.some((s) => s.id === revision.requirementSetId)) {
      throw AppError.badRequest('invalid_input', 'That revision is not one of this product line’s requirement sets.', { revisionId: 'not a revision of this product line' });
    }
    return revision;
  }
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

export async function createAssessment(actor: SessionUser, candidateId: number, input: { revisionId?: number | undefined }): Promise<StoredAssessment> {
  const candidate = await findCandidate(candidateId);
  const picked = await pickRevision(candidate, input.revisionId);
  assertApproved(picked);
  const id = await inTransaction(async (t) => {
    // A shared lock on the revision: it cannot be retired while this assessment is stored.
    await RevisionModel.findByPk(picked.id, { transaction: t, lock: t.LOCK.SHARE });
    const revision = (await revisionRepository.findById(picked.id, t))!;
    assertApproved(revision);
    const result = parseWithEngine('design', () => evaluate(candidate.design, revision.requirements));
    const stored = {
      candidateId,
      revisionId: revision.id,
      revisionSha256: revision.sha256!,
      engineVersion: result.engineVersion ?? ENGINE_VERSION,
      verdict: result.verdict ?? 'noncompliant',
      result,
      createdBy: actor.id,
    };
    const newId = await assessmentRepository.create(stored, t);
    await recordAudit(t, actor, {
      action: 'assessment.create',
      entityType: 'assessment',
      entityId: newId,
      productLineId: candidate.productLineId,
      after: { id: newId, ...stored },
    });
    if (stored.verdict === 'noncompliant') {
      await noticeAssessmentNotCompliant(t, { assessmentId: newId, candidate, revision, result });
    }
    return newId;
  });
  return getAssessment(id);
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
