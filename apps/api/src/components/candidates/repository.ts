import { QueryTypes, type Transaction } from 'sequelize';

import { getSequelize } from '../../lib/transaction.js';
import { CandidateModel } from './model.js';

export interface CandidateRecord {
  id: number;
  productLineId: number;
  name: string;
  notes: string;
  design: Record<string, unknown>;
  createdBy: number | null;
  createdAt: string;
}

/** Just what an engine run needs, read without model instances (impact over many candidates). */
export interface CandidateDesign {
  id: number;
  name: string;
  design: Record<string, unknown>;
}

type CandidateRow = Pick<CandidateModel, 'id' | 'productLineId' | 'name' | 'notes' | 'designJson' | 'createdBy' | 'createdAt'>;

function toRecord(row: CandidateModel | CandidateRow | null | undefined): CandidateRecord | null {
  if (!row) return null;
  const c: CandidateRow = row instanceof CandidateModel ? row.get({ plain: true }) : row;
  return {
    id: c.id,
    productLineId: c.productLineId,
    name: c.name,
    notes: c.notes,
    design: JSON.parse(c.designJson) as Record<string, unknown>,
    createdBy: c.createdBy,
    createdAt: new Date(c.createdAt).toISOString(),
  };
}

export interface NewCandidate {
  productLineId: number;
  name: string;
  notes: string;
  design: Record<string, unknown>;
  createdBy: number;
}

export const candidateRepository = {
  // A plain query: every assessment request reads its candidate.
  async findById(id: number, transaction?: Transaction): Promise<CandidateRecord | null> {
    const rows = await getSequelize().query<CandidateRow>(
      'SELECT id, product_line_id AS productLineId, name, notes, design_json AS designJson, created_by AS createdBy, created_at AS createdAt FROM candidates WHERE id = ?',
      { replacements: [id], type: QueryTypes.SELECT, transaction },
    );
    return toRecord(rows[0]);
  },
  async listByLine(productLineId: number, limit: number, offset: number): Promise<{ items: CandidateRecord[]; total: number }> {
    const { rows, count } = await CandidateModel.findAndCountAll({ where: { productLineId }, order: [['id', 'DESC']], limit, offset });
    return { items: rows.map((r) => toRecord(r)!), total: count };
  },
  async listAllByLine(productLineId: number, transaction?: Transaction): Promise<{ id: number; name: string }[]> {
    const rows = await getSequelize().query<{ id: number; name: string }>('SELECT id, name FROM candidates WHERE product_line_id = ? ORDER BY name, id', {
      replacements: [productLineId],
      type: QueryTypes.SELECT,
      transaction,
    });
    return rows.map((r) => ({ id: Number(r.id), name: r.name }));
  },
  async designsByLine(productLineId: number, transaction?: Transaction): Promise<CandidateDesign[]> {
    const rows = await getSequelize().query<{ id: number; name: string; design_json: string }>(
      'SELECT id, name, design_json FROM candidates WHERE product_line_id = ? ORDER BY id',
      { replacements: [productLineId], type: QueryTypes.SELECT, transaction },
    );
    return rows.map((r) => ({ id: Number(r.id), name: r.name, design: JSON.parse(r.design_json) as Record<string, unknown> }));
  },
  async create(data: NewCandidate, transaction: Transaction): Promise<CandidateRecord> {
    const row = await CandidateModel.create(
      { productLineId: data.productLineId, name: data.name, notes: data.notes, designJson: JSON.stringify(data.design), createdBy: data.createdBy },
      { transaction },
    );
    return toRecord(row)!;
  },
};
