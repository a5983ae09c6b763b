import { QueryTypes, type Transaction } from 'sequelize';

import { getSequelize } from '../../lib/transaction.js';
import { ProductLineModel } from './model.js';

export interface ProductLineRecord {
  id: number;
  name: string;
  description: string;
  createdBy: number | null;
  createdAt: string;
  updatedAt: string;
}

export interface ProductLineCounts {
  requirementSetCount: number;
  candidateCount: number;
}

function toRecord(row: ProductLineModel | null): ProductLineRecord | null {
  if (!row) return null;
  const p = row.get({ plain: true });
  return {
    id: p.id,
    name: p.name,
    description: p.description,
    createdBy: p.createdBy,
    createdAt: new Date(p.createdAt).toISOString(),
    updatedAt: new Date(p.updatedAt).toISOString(),
  };
}

export const productLineRepository = {
  async list(limit: number, offset: number): Promise<{ items: ProductLineRecord[]; total: number }> {
    const { rows, count } = await ProductLineModel.findAndCountAll({ order: [['name', 'ASC']], limit, offset });
    return { items: rows.map((r) => toRecord(r)!), total: count };
  },
  async findById(id: number, transaction?: Transaction): Promise<ProductLineRecord | null> {
    return toRecord(await ProductLineModel.findByPk(id, { transaction }));
  },
  async findByName(name: string, transaction?: Transaction): Promise<ProductLineRecord | null> {
    return toRecord(await ProductLineModel.findOne({ where: { name }, transaction }));
  },
  async create(data: { name: string; description: string; createdBy: number | null }, transaction?: Transaction): Promise<ProductLineRecord> {
    return toRecord(await ProductLineModel.create(data, { transaction }))!;
  },
  async update(id: number, changes: Partial<{ name: string; description: string }>, transaction?: Transaction): Promise<ProductLineRecord | null> {
    await ProductLineModel.update(changes, { where: { id }, transaction });
    return toRecord(await ProductLineModel.findByPk(id, { transaction }));
  },
  /** Requirement-set and candidate counts for the given lines, in two grouped queries. */
  async countsFor(ids: number[]): Promise<Map<number, ProductLineCounts>> {
    const out = new Map<number, ProductLineCounts>(ids.map((id) => [id, { requirementSetCount: 0, candidateCount: 0 }]));
    if (ids.length === 0) return out;
    const sequelize = getSequelize();
    const sets = await sequelize.query<{ id: number; n: number }>(
      'SELECT product_line_id AS id, COUNT(*) AS n FROM requirement_sets WHERE product_line_id IN (:ids) GROUP BY product_line_id',
      { replacements: { ids }, type: QueryTypes.SELECT },
    );
    const candidates = await sequelize.query<{ id: number; n: number }>(
      'SELECT product_line_id AS id, COUNT(*) AS n FROM candidates WHERE product_line_id IN (:ids) GROUP BY product_line_id',
      { replacements: { ids }, type: QueryTypes.SELECT },
    );
    for (const r of sets) out.get(Number(r.id))!.requirementSetCount = Number(r.n);
    for (const r of candidates) out.get(Number(r.id))!.candidateCount = Number(r.n);
    return out;
  },
  /** Locks the line row so concurrent writers of its children line up. */
  async lock(id: number, transaction: Transaction): Promise<ProductLineRecord | null> {
    return toRecord(await ProductLineModel.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE }));
  },
};
