import { Op, QueryTypes, type InferAttributes, type Transaction } from 'sequelize';

import type { ImpactAcknowledgement, Revision, RevisionStatus } from '@polecourt/contracts';

import { personOrUnknown, personRefs } from '../../lib/person-refs.js';
import { getSequelize } from '../../lib/transaction.js';
import { RevisionModel } from './model.js';

/** A revision as stored, plus the person fields; what use cases work with. */
export interface RevisionRecord {
  id: number;
  requirementSetId: number;
  number: number;
  status: RevisionStatus;
  requirements: Record<string, number>;
  rationale: string;
  version: number;
  authorId: number;
  approverId: number | null;
  submittedAt: string | null;
  approvedAt: string | null;
  retiredAt: string | null;
  sha256: string | null;
  approvalMeaning: 'approved' | null;
  impact: ImpactAcknowledgement | null;
  createdAt: string;
  updatedAt: string;
}

const iso = (d: Date | string | null | undefined): string | null => (d ? new Date(d).toISOString() : null);

type RevisionRow = InferAttributes<RevisionModel>;

function toRecord(row: RevisionModel | RevisionRow | null | undefined): RevisionRecord | null {
  if (!row) return null;
  const r = (row instanceof RevisionModel ? row.get({ plain: true }) : row) as RevisionRow;
  return {
    id: r.id,
    requirementSetId: r.requirementSetId,
    number: r.number,
    status: r.status,
    requirements: JSON.parse(r.requirementsJson) as Record<string, number>,
    rationale: r.rationale,
    version: r.version,
    authorId: r.authorId,
    approverId: r.approverId ?? null,
    submittedAt: iso(r.submittedAt),
    approvedAt: iso(r.approvedAt),
    retiredAt: iso(r.retiredAt),
    sha256: r.sha256 ?? null,
    approvalMeaning: r.approvalMeaning === 'approved' ? 'approved' : null,
    impact: r.impactJson ? (JSON.parse(r.impactJson) as ImpactAcknowledgement) : null,
    createdAt: iso(r.createdAt)!,
    updatedAt: iso(r.updatedAt)!,
  };
}

export interface RevisionChanges {
  status?: RevisionStatus;
  requirements?: Record<string, number>;
  rationale?: string;
  version?: number;
  approverId?: number;
  submittedAt?: Date;
  approvedAt?: Date;
  retiredAt?: Date;
  sha256?: string;
  approvalMeaning?: 'approved';
  impact?: ImpactAcknowledgement;
}

function toColumns(c: RevisionChanges): Partial<RevisionModel> {
  const { requirements, impact, ...rest } = c;
  return {
    ...rest,
    ...(requirements !== undefined ? { requirementsJson: JSON.stringify(requirements) } : {}),
    ...(impact !== undefined ? { impactJson: JSON.stringify(impact) } : {}),
  } as Partial<RevisionModel>;
}

// The columns under the model's attribute names, for plain queries on hot
// paths (a revision is read by every region, impact and assessment request).
const COLUMNS = `id, requirement_set_id AS requirementSetId, number, status, requirements_json AS requirementsJson, rationale, version,
  author_id AS authorId, approver_id AS approverId, submitted_at AS submittedAt, approved_at AS approvedAt, retired_at AS retiredAt,
  sha256, approval_meaning AS approvalMeaning, impact_json AS impactJson, created_at AS createdAt, updated_at AS updatedAt`;

async function selectById(id: number, transaction: Transaction | undefined, lock: '' | 'FOR UPDATE' | 'LOCK IN SHARE MODE'): Promise<RevisionRecord | null> {
  const rows = await getSequelize().query<RevisionRow>(`SELECT ${COLUMNS} FROM revisions WHERE id = ? ${lock}`, { replacements: [id], type: QueryTypes.SELECT, transaction });
  return toRecord(rows[0]);
}

export const revisionRepository = {
  findById(id: number, transaction?: Transaction): Promise<RevisionRecord | null> {
    return selectById(id, transaction, '');
  },
  lock(id: number, transaction: Transaction): Promise<RevisionRecord | null> {
    return selectById(id, transaction, 'FOR UPDATE');
  },
  /** Read under a shared lock: the row cannot change (be retired) until the transaction ends. */
  lockShared(id: number, transaction: Transaction): Promise<RevisionRecord | null> {
    return selectById(id, transaction, 'LOCK IN SHARE MODE');
  },
  async listBySet(requirementSetId: number, transaction?: Transaction): Promise<RevisionRecord[]> {
    const rows = await RevisionModel.findAll({ where: { requirementSetId }, order: [['number', 'DESC']], transaction });
    return rows.map((r) => toRecord(r)!);
  },
  async findApproved(requirementSetId: number, transaction?: Transaction): Promise<RevisionRecord | null> {
    return toRecord(await RevisionModel.findOne({ where: { requirementSetId, status: 'approved' }, transaction }));
  },
  async findApprovedInSets(setIds: number[], transaction?: Transaction): Promise<RevisionRecord[]> {
    if (setIds.length === 0) return [];
    const rows = await RevisionModel.findAll({ where: { requirementSetId: { [Op.in]: setIds }, status: 'approved' }, order: [['requirementSetId', 'ASC']], transaction });
    return rows.map((r) => toRecord(r)!);
  },
  async findByIds(ids: number[], transaction?: Transaction): Promise<RevisionRecord[]> {
    if (ids.length === 0) return [];
    const rows = await RevisionModel.findAll({ where: { id: { [Op.in]: ids } }, transaction });
    return rows.map((r) => toRecord(r)!);
  },
  async nextNumber(requirementSetId: number, transaction: Transaction): Promise<number> {
    const max = (await RevisionModel.max('number', { where: { requirementSetId }, transaction })) as number | null;
    return (Number(max) || 0) + 1;
  },
  async create(
    data: { requirementSetId: number; number: number; requirements: Record<string, number>; rationale: string; authorId: number },
    transaction: Transaction,
  ): Promise<RevisionRecord> {
    const row = await RevisionModel.create(
      {
        requirementSetId: data.requirementSetId,
        number: data.number,
        status: 'draft',
        requirementsJson: JSON.stringify(data.requirements),
        rationale: data.rationale,
        authorId: data.authorId,
      },
      { transaction },
    );
    return toRecord(await RevisionModel.findByPk(row.id, { transaction }))!;
  },
  async update(id: number, changes: RevisionChanges, transaction: Transaction): Promise<RevisionRecord> {
    await RevisionModel.update(toColumns(changes), { where: { id }, transaction });
    return toRecord(await RevisionModel.findByPk(id, { transaction }))!;
  },
};

/** The contract's Revision: the record with author and approver named. */
export async function toRevisions(records: RevisionRecord[], transaction?: Transaction): Promise<Revision[]> {
  const people = await personRefs(records.flatMap((r) => [r.authorId, r.approverId]), transaction);
  return records.map((r) => {
    const { authorId, approverId, ...rest } = r;
    return { ...rest, author: personOrUnknown(people, authorId)!, approver: personOrUnknown(people, approverId) };
  });
}

export async function toRevision(record: RevisionRecord, transaction?: Transaction): Promise<Revision> {
  return (await toRevisions([record], transaction))[0]!;
}
