import type { ListResponse, RequirementSet, RequirementSetInput, RequirementSetSummary } from '@polecourt/contracts';

import { AppError } from '../../lib/app-error.js';
import type { SessionUser } from '../../lib/request-context.js';
import { inTransaction } from '../../lib/transaction.js';
import { recordAudit } from '../audit/record-audit.js';
import { productLineRepository } from '../product-lines/repository.js';
import { revisionRepository, toRevisions } from '../revisions/repository.js';
import { requirementSetRepository } from './repository.js';

async function assertLineExists(productLineId: number): Promise<void> {
  if (!(await productLineRepository.findById(productLineId))) throw AppError.notFound('That product line');
}

export async function listRequirementSets(productLineId: number, limit: number, offset: number): Promise<ListResponse<RequirementSetSummary>> {
  await assertLineExists(productLineId);
  const { items, total } = await requirementSetRepository.listByLine(productLineId, limit, offset);
  const stats = await requirementSetRepository.statsFor(items.map((s) => s.id));
  return {
    items: items.map((s) => ({
      id: s.id,
      productLineId: s.productLineId,
      name: s.name,
      purpose: s.purpose,
      createdAt: s.createdAt,
      ...stats.get(s.id)!,
    })),
    total,
  };
}

export async function getRequirementSet(id: number): Promise<RequirementSet> {
  const set = await requirementSetRepository.findById(id);
  if (!set) throw AppError.notFound('That requirement set');
  const revisions = await toRevisions(await revisionRepository.listBySet(id));
  return {
    id: set.id,
    productLineId: set.productLineId,
    name: set.name,
    purpose: set.purpose,
    createdAt: set.createdAt,
    revisions,
    currentRevisionId: revisions.find((r) => r.status === 'approved')?.id ?? null,
  };
}

export async function createRequirementSet(actor: SessionUser, productLineId: number, input: Required<RequirementSetInput>): Promise<RequirementSet> {
  const created = await inTransaction(async (t) => {
    // The line's row lock makes the name check and the insert one step.
    const line = await productLineRepository.lock(productLineId, t);
    if (!line) throw AppError.notFound('That product line');
    if (await requirementSetRepository.findByName(productLineId, input.name, t)) {
      throw AppError.conflict('name_taken', `${line.name} already has a requirement set called “${input.name}”.`);
    }
    const set = await requirementSetRepository.create({ productLineId, name: input.name, purpose: input.purpose, createdBy: actor.id }, t);
    await recordAudit(t, actor, { action: 'requirement_set.create', entityType: 'requirement_set', entityId: set.id, productLineId, after: set });
    return set;
  });
  return { id: created.id, productLineId, name: created.name, purpose: created.purpose, createdAt: created.createdAt, revisions: [], currentRevisionId: null };
}
