import type { CoverageFilter, CoverageReport, CoverageRow, CoverageStatus } from '@polecourt/contracts';

import { AppError } from '../../lib/app-error.js';
import { csvDocument } from '../../lib/csv-writer.js';
import { assessmentRepository, type LatestAssessment } from '../assessments/repository.js';
import { candidateRepository } from '../candidates/repository.js';
import { productLineRepository } from '../product-lines/repository.js';
import { requirementSetRepository } from '../requirement-sets/repository.js';
import { revisionRepository } from '../revisions/repository.js';

function statusFor(latest: LatestAssessment[], setId: number | null, revisionId: number | null): { status: CoverageStatus; basis: LatestAssessment | null } {
  const inSet = latest.filter((a) => setId === null || a.requirementSetId === setId);
  const current = revisionId === null ? undefined : inSet.find((a) => a.revisionId === revisionId);
  if (current) return { status: current.verdict, basis: current };
  // Newest first (the repository orders by id descending).
  const retired = inSet.find((a) => a.revisionStatus === 'retired');
  if (retired) return { status: 'retired_only', basis: retired };
  return { status: 'never_assessed', basis: null };
}

const MATCHES: Record<CoverageFilter, (s: CoverageStatus) => boolean> = {
  all: () => true,
  never_assessed: (s) => s === 'never_assessed',
  retired_only: (s) => s === 'retired_only',
  noncompliant: (s) => s === 'noncompliant',
};

/**
 * Every candidate of the line against every approved revision of it (one
 * per requirement set), with the newest verdict: compliant or noncompliant
 * when assessed against that revision, retired_only when assessed only
 * against retired revisions of the set, never_assessed otherwise. A line
 * with no approved revision still lists each candidate once.
 */
export async function coverage(productLineId: number, filter: CoverageFilter): Promise<CoverageReport> {
  const line = await productLineRepository.findById(productLineId);
  if (!line) throw AppError.notFound('That product line');
  const sets = await requirementSetRepository.listAllByLine(productLineId);
  const approved = await revisionRepository.findApprovedInSets(sets.map((s) => s.id));
  const candidates = await candidateRepository.listAllByLine(productLineId);
  const latest = await assessmentRepository.latestPerRevision(candidates.map((c) => c.id));
  const byCandidate = new Map<number, LatestAssessment[]>();
  for (const a of latest) byCandidate.set(a.candidateId, [...(byCandidate.get(a.candidateId) ?? []), a]);

  const columns = approved.length
    ? approved.map((r) => ({ set: sets.find((s) => s.id === r.requirementSetId)!, revision: r }))
    : [{ set: null, revision: null }];
  const items: CoverageRow[] = [];
  for (const c of candidates) {
    for (const col of columns) {
      const { status, basis } = statusFor(byCandidate.get(c.id) ?? [], col.set?.id ?? null, col.revision?.id ?? null);
      if (!MATCHES[filter](status)) continue;
      items.push({
        candidateId: c.id,
        candidateName: c.name,
        requirementSetId: col.set?.id ?? null,
        requirementSetName: col.set?.name ?? null,
        revisionId: col.revision?.id ?? null,
        revisionNumber: col.revision?.number ?? null,
        status,
        assessmentId: basis?.assessmentId ?? null,
        assessedAt: basis?.createdAt ?? null,
        assessedRevisionId: basis?.revisionId ?? null,
      });
    }
  }
  return { productLineId, filter, total: items.length, items };
}

export const COVERAGE_CSV_HEADER = ['candidate_id', 'candidate', 'requirement_set', 'revision', 'status', 'assessment_id', 'assessed_at', 'assessed_revision_id'];

export function coverageCsv(report: CoverageReport): string {
  return csvDocument(
    COVERAGE_CSV_HEADER,
    report.items.map((r) => [r.candidateId, r.candidateName, r.requirementSetName, r.revisionNumber, r.status, r.assessmentId, r.assessedAt, r.assessedRevisionId]),
  );
}
