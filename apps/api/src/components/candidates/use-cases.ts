import type { Candidate, CandidateAssessmentSummary, ListResponse, UploadReport } from '@polecourt/contracts';
import { candidateInputBaseSchema } from '@polecourt/contracts';
import { parseDesign } from '@polecourt/spec';

import { AppError } from '../../lib/app-error.js';
import { parseWithEngine, tryParseWithEngine } from '../../lib/engine-input.js';
import { personOrUnknown, personRefs } from '../../lib/person-refs.js';
import type { SessionUser } from '../../lib/request-context.js';
import { inTransaction } from '../../lib/transaction.js';
import { assessmentRepository } from '../assessments/repository.js';
import { recordAudit } from '../audit/record-audit.js';
import { productLineRepository } from '../product-lines/repository.js';
import { candidateRepository, type CandidateRecord, type NewCandidate } from './repository.js';
import { readUpload, type RawRow } from './upload-rows.js';

async function toCandidates(records: CandidateRecord[]): Promise<Candidate[]> {
  const people = await personRefs(records.map((r) => r.createdBy));
  const latest = await assessmentRepository.latestPerRevision(records.map((r) => r.id));
  const byCandidate = new Map<number, CandidateAssessmentSummary[]>();
  for (const a of latest) {
    const { candidateId, ...summary } = a;
    const list = byCandidate.get(candidateId) ?? [];
    list.push(summary);
    byCandidate.set(candidateId, list);
  }
  return records.map((r) => ({
    id: r.id,
    productLineId: r.productLineId,
    name: r.name,
    notes: r.notes,
    design: r.design,
    createdBy: personOrUnknown(people, r.createdBy) ?? { id: 0, name: 'Unknown user', email: '' },
    createdAt: r.createdAt,
    latest: byCandidate.get(r.id) ?? [],
  }));
}

async function assertLineExists(productLineId: number): Promise<void> {
  if (!(await productLineRepository.findById(productLineId))) throw AppError.notFound('That product line');
}

/** Saves candidates and one audit event each, all in one transaction: all land or none. */
async function saveAll(actor: SessionUser, rows: NewCandidate[]): Promise<CandidateRecord[]> {
  return inTransaction(async (t) => {
    const saved: CandidateRecord[] = [];
    for (const row of rows) saved.push(await candidateRepository.create(row, t));
    // Audited after the inserts: the audit chain's head row stays locked from
    // the first event to the commit, so that stretch is kept short.
    for (const c of saved) {
      await recordAudit(t, actor, { action: 'candidate.create', entityType: 'candidate', entityId: c.id, productLineId: c.productLineId, after: c });
    }
    return saved;
  });
}

// ---- one candidate ------------------------------------------------------------

export async function createCandidate(
  actor: SessionUser,
  productLineId: number,
  input: { name: string; notes: string; design: unknown },
): Promise<Candidate> {
  await assertLineExists(productLineId);
  parseWithEngine('design', () => parseDesign(input.design));
  const [saved] = await saveAll(actor, [{ productLineId, name: input.name, notes: input.notes, design: input.design as Record<string, unknown>, createdBy: actor.id }]);
  return (await toCandidates([saved!]))[0]!;
}

// ---- an uploaded file -----------------------------------------------------------

function checkRow(raw: RawRow): { ok: true; name: string; notes: string; design: Record<string, unknown> } | { ok: false; errors: Record<string, string> } {
  if (raw.errors) return { ok: false, errors: raw.errors };
  const errors: Record<string, string> = {};
  const base = candidateInputBaseSchema.safeParse({ name: raw.input?.name, notes: raw.input?.notes ?? undefined });
  if (!base.success) for (const issue of base.error.issues) errors[issue.path.map(String).join('.') || '_'] ??= issue.message;
  const design = tryParseWithEngine('design', () => parseDesign(raw.input?.design));
  if ('errors' in design) {
    for (const [field, message] of Object.entries(design.errors)) {
      // A CSV row names the column: design.poles[1] came from the poles cell.
      const key = raw.source === 'csv' ? (/^design\.([a-z]+)/.exec(field)?.[1] ?? 'design') : field;
      errors[key] ??= message;
    }
  }
  if (Object.keys(errors).length || !base.success) return { ok: false, errors };
  return { ok: true, name: base.data.name, notes: base.data.notes, design: raw.input!.design as Record<string, unknown> };
}

export async function uploadCandidates(actor: SessionUser, productLineId: number, file: Buffer): Promise<UploadReport> {
  await assertLineExists(productLineId);
  const rows = readUpload(file);
  const report: UploadReport = { accepted: [], rejected: [] };
  const good: { row: number; data: NewCandidate }[] = [];
  for (const raw of rows) {
    const checked = checkRow(raw);
    if (checked.ok) good.push({ row: raw.row, data: { productLineId, name: checked.name, notes: checked.notes, design: checked.design, createdBy: actor.id } });
    else report.rejected.push({ row: raw.row, name: raw.name, errors: checked.errors });
  }
  if (good.length) {
    const saved = await saveAll(actor, good.map((g) => g.data));
    report.accepted = saved.map((c, i) => ({ row: good[i]!.row, name: c.name, candidateId: c.id }));
  }
  return report;
}

// ---- reads ----------------------------------------------------------------------

export async function listCandidates(productLineId: number, limit: number, offset: number): Promise<ListResponse<Candidate>> {
  await assertLineExists(productLineId);
  const { items, total } = await candidateRepository.listByLine(productLineId, limit, offset);
  return { items: await toCandidates(items), total };
}

export async function getCandidate(id: number): Promise<Candidate> {
  const record = await candidateRepository.findById(id);
  if (!record) throw AppError.notFound('That candidate');
  return (await toCandidates([record]))[0]!;
}
