import type { Transaction } from 'sequelize';

import { ProductLineModel } from './model.js';

export interface ProductLineRecord {
  id: number;
  name: string;
  description: string;
  createdBy: number | null;
  createdAt: string;
  updatedAt: string;
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
};
