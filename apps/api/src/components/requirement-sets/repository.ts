import { QueryTypes, type Transaction } from 'sequelize';

import { getSequelize } from '../../lib/transaction.js';
import { RequirementSetModel } from './model.js';

export interface RequirementSetRecord {
  id: number;
  productLineId: number;
  name: string;
  purpose: string;
  createdBy: number | null;
  createdAt: string;
}

export interface RequirementSetStats {
  currentRevisionId: number | null;
  currentRevisionNumber: number | null;
  revisionCount: number;
}

type RequirementSetRow = Pick<RequirementSetModel, 'id' | 'productLineId' | 'name' | 'purpose' | 'createdBy' | 'createdAt'>;

function toRecord(row: RequirementSetModel | RequirementSetRow | null | undefined): RequirementSetRecord | null {
  if (!row) return null;
  const s: RequirementSetRow = row instanceof RequirementSetModel ? row.get({ plain: true }) : row;
  return {
    id: s.id,
    productLineId: s.productLineId,
    name: s.name,
    purpose: s.purpose,
    createdBy: s.createdBy,
    createdAt: new Date(s.createdAt).toISOString(),
  };
}

// A plain query for reads by id (every assessment checks its revision's set).
async function selectById(id: number, transaction: Transaction | undefined, lock: '' | 'FOR UPDATE'): Promise<RequirementSetRecord | null> {
  const rows = await getSequelize().query<RequirementSetRow>(
    `SELECT id, product_line_id AS productLineId, name, purpose, created_by AS createdBy, created_at AS createdAt FROM requirement_sets WHERE id = ? ${lock}`,
    { replacements: [id], type: QueryTypes.SELECT, transaction },
  );
  return toRecord(rows[0]);
}

export const requirementSetRepository = {
  findById(id: number, transaction?: Transaction): Promise<RequirementSetRecord | null> {
    return selectById(id, transaction, '');
  },
  /** Locks the set's row: approvals and new revision numbers of one set line up behind it. */
  lock(id: number, transaction: Transaction): Promise<RequirementSetRecord | null> {
    return selectById(id, transaction, 'FOR UPDATE');
  },
  async findByName(productLineId: number, name: string, transaction?: Transaction): Promise<RequirementSetRecord | null> {
    return toRecord(await RequirementSetModel.findOne({ where: { productLineId, name }, transaction }));
  },
  async listByLine(productLineId: number, limit: number, offset: number): Promise<{ items: RequirementSetRecord[]; total: number }> {
    const { rows, count } = await RequirementSetModel.findAndCountAll({ where: { productLineId }, order: [['name', 'ASC'], ['id', 'ASC']], limit, offset });
    return { items: rows.map((r) => toRecord(r)!), total: count };
  },
  async listAllByLine(productLineId: number, transaction?: Transaction): Promise<RequirementSetRecord[]> {
    const rows = await RequirementSetModel.findAll({ where: { productLineId }, order: [['id', 'ASC']], transaction });
    return rows.map((r) => toRecord(r)!);
  },
  async create(data: { productLineId: number; name: string; purpose: string; createdBy: number }, transaction: Transaction): Promise<RequirementSetRecord> {
    return toRecord(await RequirementSetModel.create(data, { transaction }))!;
  },
  async statsFor(ids: number[]): Promise<Map<number, RequirementSetStats>> {
    const out = new Map<number, RequirementSetStats>(ids.map((id) => [id, { currentRevisionId: null, currentRevisionNumber: null, revisionCount: 0 }]));
    if (ids.length === 0) return out;
    const rows = await getSequelize().query<{ setId: number; n: number; approvedId: number | null; approvedNumber: number | null }>(
      `SELECT requirement_set_id AS setId, COUNT(*) AS n,
              MAX(CASE WHEN status = 'approved' THEN id END) AS approvedId,
              MAX(CASE WHEN status = 'approved' THEN number END) AS approvedNumber
         FROM revisions WHERE requirement_set_id IN (:ids) GROUP BY requirement_set_id`,
      { replacements: { ids }, type: QueryTypes.SELECT },
    );
    for (const r of rows) {
      out.set(Number(r.setId), {
        revisionCount: Number(r.n),
        currentRevisionId: r.approvedId === null ? null : Number(r.approvedId),
        currentRevisionNumber: r.approvedNumber === null ? null : Number(r.approvedNumber),
      });
    }
    return out;
  },
};
