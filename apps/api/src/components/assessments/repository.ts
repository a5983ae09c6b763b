import { QueryTypes, type Transaction } from 'sequelize';

import type { RevisionStatus } from '@polecourt/contracts';

import { bindRows } from '../../lib/bind-rows.js';
import { getSequelize } from '../../lib/transaction.js';
import { AssessmentModel } from './model.js';

export interface AssessmentRecord {
  id: number;
  candidateId: number;
  revisionId: number;
  revisionSha256: string;
  engineVersion: string;
  verdict: string;
  result: Record<string, unknown>;
  createdBy: number | null;
  createdAt: string;
  /** Read from the revision now, not stored: a since-retired baseline says so. */
  revisionStatus: RevisionStatus;
}

/** The newest assessment of one candidate against one revision. */
export interface LatestAssessment {
  candidateId: number;
  assessmentId: number;
  revisionId: number;
  revisionNumber: number;
  requirementSetId: number;
  revisionStatus: RevisionStatus;
  verdict: 'compliant' | 'noncompliant';
  createdAt: string;
}

interface AssessmentRow {
  id: number;
  candidate_id: number;
  revision_id: number;
  revision_sha256: string;
  engine_version: string;
  verdict: string;
  result_json: string;
  created_by: number | null;
  created_at: Date | string;
  revision_status: RevisionStatus;
}

const SELECT_WITH_STATUS = `SELECT a.id, a.candidate_id, a.revision_id, a.revision_sha256, a.engine_version, a.verdict, a.result_json,
       a.created_by, a.created_at, r.status AS revision_status
  FROM assessments a JOIN revisions r ON r.id = a.revision_id`;

function toRecord(r: AssessmentRow): AssessmentRecord {
  return {
    id: Number(r.id),
    candidateId: Number(r.candidate_id),
    revisionId: Number(r.revision_id),
    revisionSha256: r.revision_sha256,
    engineVersion: r.engine_version,
    verdict: r.verdict,
    result: JSON.parse(r.result_json) as Record<string, unknown>,
    createdBy: r.created_by === null ? null : Number(r.created_by),
    createdAt: new Date(r.created_at).toISOString(),
    revisionStatus: r.revision_status,
  };
}

export interface NewAssessment {
  candidateId: number;
  revisionId: number;
  revisionSha256: string;
  engineVersion: string;
  verdict: string;
  result: unknown;
  createdBy: number;
}

export const assessmentRepository = {
  async create(data: NewAssessment & { createdAt?: Date }, transaction: Transaction): Promise<number> {
    const [id] = await assessmentRepository.createMany([data], transaction);
    return id!;
  },
  /**
   * Several assessments in one statement (one round trip, where a loop of
   * single inserts pays one per row); the ids come back in the order given.
   */
  async createMany(rows: (NewAssessment & { createdAt?: Date })[], transaction: Transaction): Promise<number[]> {
    if (rows.length === 0) return [];
    const now = new Date();
    const bind = rows.flatMap((d) => [d.candidateId, d.revisionId, d.revisionSha256, d.engineVersion, d.verdict, JSON.stringify(d.result), d.createdBy, d.createdAt ?? now]);
    const inserted = await getSequelize().query<{ id: number }>(
      `INSERT INTO assessments (candidate_id, revision_id, revision_sha256, engine_version, verdict, result_json, created_by, created_at)
       VALUES ${bindRows(rows.length, 8)} RETURNING id`,
      { bind, type: QueryTypes.SELECT, transaction },
    );
    if (inserted.length !== rows.length) throw new Error(`inserted ${inserted.length} assessments of ${rows.length}`);
    return inserted.map((r) => Number(r.id));
  },
  async findById(id: number, transaction?: Transaction): Promise<AssessmentRecord | null> {
    const rows = await getSequelize().query<AssessmentRow>(`${SELECT_WITH_STATUS} WHERE a.id = ?`, { replacements: [id], type: QueryTypes.SELECT, transaction });
    return rows[0] ? toRecord(rows[0]) : null;
  },
  async listByCandidate(candidateId: number, limit: number, offset: number): Promise<{ items: AssessmentRecord[]; total: number }> {
    const sequelize = getSequelize();
    const rows = await sequelize.query<AssessmentRow>(`${SELECT_WITH_STATUS} WHERE a.candidate_id = ? ORDER BY a.id DESC LIMIT ? OFFSET ?`, {
      replacements: [candidateId, limit, offset],
      type: QueryTypes.SELECT,
    });
    const total = await AssessmentModel.count({ where: { candidateId } });
    return { items: rows.map(toRecord), total };
  },
  /** For each (candidate, revision) pair among these candidates: the newest assessment. */
  async latestPerRevision(candidateIds: number[], transaction?: Transaction): Promise<LatestAssessment[]> {
    if (candidateIds.length === 0) return [];
    const rows = await getSequelize().query<{
      candidate_id: number;
      id: number;
      revision_id: number;
      number: number;
      requirement_set_id: number;
      status: RevisionStatus;
      verdict: 'compliant' | 'noncompliant';
      created_at: Date | string;
    }>(
      `SELECT a.candidate_id, a.id, a.revision_id, r.number, r.requirement_set_id, r.status, a.verdict, a.created_at
         FROM assessments a
         JOIN (SELECT MAX(id) AS id FROM assessments WHERE candidate_id IN (:ids) GROUP BY candidate_id, revision_id) l ON l.id = a.id
         JOIN revisions r ON r.id = a.revision_id
        ORDER BY a.candidate_id, a.id DESC`,
      { replacements: { ids: candidateIds }, type: QueryTypes.SELECT, transaction },
    );
    return rows.map((r) => ({
      candidateId: Number(r.candidate_id),
      assessmentId: Number(r.id),
      revisionId: Number(r.revision_id),
      revisionNumber: Number(r.number),
      requirementSetId: Number(r.requirement_set_id),
      revisionStatus: r.status,
      verdict: r.verdict,
      createdAt: new Date(r.created_at).toISOString(),
    }));
  },
};

/** The newest stored result per candidate against one revision, for reuse where the engine version matches. */
export async function latestResultsFor(revisionId: number, candidateIds: number[], transaction?: Transaction): Promise<Map<number, { engineVersion: string; revisionSha256: string; result: Record<string, unknown> }>> {
  const out = new Map<number, { engineVersion: string; revisionSha256: string; result: Record<string, unknown> }>();
  if (candidateIds.length === 0) return out;
  const rows = await getSequelize().query<{ candidate_id: number; engine_version: string; revision_sha256: string; result_json: string }>(
    `SELECT a.candidate_id, a.engine_version, a.revision_sha256, a.result_json
       FROM assessments a
       JOIN (SELECT MAX(id) AS id FROM assessments WHERE revision_id = :revisionId AND candidate_id IN (:ids) GROUP BY candidate_id) l ON l.id = a.id`,
    { replacements: { revisionId, ids: candidateIds }, type: QueryTypes.SELECT, transaction },
  );
  for (const r of rows) {
    out.set(Number(r.candidate_id), { engineVersion: r.engine_version, revisionSha256: r.revision_sha256, result: JSON.parse(r.result_json) as Record<string, unknown> });
  }
  return out;
}
