import type { ListResponse, ProductLine } from '@polecourt/contracts';

import { AppError } from '../../lib/app-error.js';
import type { SessionUser } from '../../lib/request-context.js';
import { inTransaction } from '../../lib/transaction.js';
import { recordAudit } from '../audit/record-audit.js';
import { productLineRepository, type ProductLineRecord } from './repository.js';

function toProductLine(p: ProductLineRecord, counts?: { requirementSetCount: number; candidateCount: number }): ProductLine {
  return {
    id: p.id,
    name: p.name,
    description: p.description,
    createdAt: p.createdAt,
    updatedAt: p.updatedAt,
    ...(counts ?? {}),
  };
}

async function assertNameFree(name: string, exceptId?: number): Promise<void> {
  const existing = await productLineRepository.findByName(name);
  if (existing && existing.id !== exceptId) {
    throw AppError.conflict('name_taken', `There is already a product line called “${name}”.`);
  }
}

export async function listProductLines(limit: number, offset: number): Promise<ListResponse<ProductLine>> {
  const { items, total } = await productLineRepository.list(limit, offset);
  const counts = await productLineRepository.countsFor(items.map((p) => p.id));
  return { items: items.map((p) => toProductLine(p, counts.get(p.id))), total };
}

export async function getProductLine(id: number): Promise<ProductLine> {
  const line = await productLineRepository.findById(id);
  if (!line) throw AppError.notFound('That product line');
  const counts = await productLineRepository.countsFor([id]);
  return toProductLine(line, counts.get(id));
}

export async function createProductLine(actor: SessionUser, input: { name: string; description: string }): Promise<ProductLine> {
  await assertNameFree(input.name);
  return inTransaction(async (t) => {
    const line = await productLineRepository.create({ ...input, createdBy: actor.id }, t);
    await recordAudit(t, actor, { action: 'product_line.create', entityType: 'product_line', entityId: line.id, productLineId: line.id, after: line });
    return toProductLine(line, { requirementSetCount: 0, candidateCount: 0 });
  });
}

export async function updateProductLine(actor: SessionUser, id: number, changes: { name?: string | undefined; description?: string | undefined }): Promise<ProductLine> {
  if (changes.name !== undefined) await assertNameFree(changes.name, id);
  const updated = await inTransaction(async (t) => {
    const before = await productLineRepository.lock(id, t);
    if (!before) throw AppError.notFound('That product line');
    const clean = Object.fromEntries(Object.entries(changes).filter(([, v]) => v !== undefined));
    const after = (await productLineRepository.update(id, clean, t))!;
    await recordAudit(t, actor, { action: 'product_line.update', entityType: 'product_line', entityId: id, productLineId: id, before, after });
    return after;
  });
  const counts = await productLineRepository.countsFor([id]);
  return toProductLine(updated, counts.get(id));
}
