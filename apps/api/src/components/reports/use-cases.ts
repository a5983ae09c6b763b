import { createHash } from 'node:crypto';

import type { IssueReportInput, ListResponse, ReportRecord, ReportVerification, StoredAssessment } from '@polecourt/contracts';
import type { Assessment } from '@polecourt/spec';

import { AppError } from '../../lib/app-error.js';
import { verifyPassword } from '../../lib/password.js';
import type { SessionUser } from '../../lib/request-context.js';
import { inTransaction } from '../../lib/transaction.js';
import { getAssessment } from '../assessments/use-cases.js';
import { auditRepository } from '../audit/repository.js';
import { recordAudit } from '../audit/record-audit.js';
import { candidateRepository, type CandidateRecord } from '../candidates/repository.js';
import { notifyReportIssued } from '../mail/notify-report-issued.js';
import { productLineRepository } from '../product-lines/repository.js';
import { requirementSetRepository } from '../requirement-sets/repository.js';
import { diffRequirements } from '../revisions/diff.js';
import { diffRevision, getRevision } from '../revisions/use-cases.js';
import { userRepository } from '../users/repository.js';
import { ArchiveConflict } from './archive.js';
import { readAttachments } from './pdf-attachments.js';
import { recompute } from './recompute.js';
import { type ReportContent } from './report-content.js';
import { reportFigures } from './report-figures.js';
import { formatReportNumber } from './report-number.js';
import { renderReport } from './report-pdf.js';
import { reportRepository, type StoredReport } from './repository.js';
import { reportServices } from './services.js';
import { verifySignature } from './verify-signature.js';

export function toReportRecord(r: StoredReport): ReportRecord {
  return {
    id: r.id,
    number: r.number,
    assessmentId: r.assessmentId,
    candidateId: r.candidateId,
    candidateName: r.candidateName,
    productLineId: r.productLineId,
    productLineName: r.productLineName,
    requirementSetId: r.requirementSetId,
    requirementSetName: r.requirementSetName,
    revisionId: r.revisionId,
    revisionNumber: r.revisionNumber,
    revisionSha256: r.revisionSha256,
    verdict: r.verdict,
    engineVersion: r.engineVersion,
    signer: { id: r.signerId, name: r.signerName, email: r.signerEmail },
    meaning: r.meaning,
    signedAt: r.signedAt,
    sha256: r.sha256,
    byteSize: r.byteSize,
    auditHeadHash: r.auditHeadHash,
  };
}

const sha256 = (b: Buffer): string => createHash('sha256').update(b).digest('hex');

// ---- steps ------------------------------------------------------------------

/** The second component of the signature (21 CFR Part 11 §11.200): the password, re-entered. A wrong one is a 400 on the field. */
async function assertSignerPassword(actor: SessionUser, password: string, assessmentId: number): Promise<void> {
  const user = await userRepository.findById(actor.id);
  const ok = user?.active && user.passwordHash ? await verifyPassword(password, user.passwordHash) : false;
  if (ok) return;
  await inTransaction((t) =>
    recordAudit(t, actor, { action: 'report.sign_refused', entityType: 'assessment', entityId: assessmentId, after: { reason: 'wrong password' } }),
  );
  throw AppError.badRequest('wrong_password', 'That password is not right; the report was not signed.', { password: 'That password is not right' });
}

async function findCandidate(id: number): Promise<CandidateRecord> {
  const candidate = await candidateRepository.findById(id);
  if (!candidate) throw AppError.notFound('The assessment’s candidate');
  return candidate;
}

/** Everything the report shows except its number, time and audit head, which are fixed inside the transaction. */
async function gatherSources(assessment: StoredAssessment) {
  const candidate = await findCandidate(assessment.candidateId);
  const revision = await getRevision(assessment.revisionId);
  if (!revision.sha256 || revision.sha256 !== assessment.revisionSha256) {
    throw AppError.conflict('revision_mismatch', 'The assessment does not match an approved revision’s content; it cannot be reported.');
  }
  const set = await requirementSetRepository.findById(revision.requirementSetId);
  const line = await productLineRepository.findById(candidate.productLineId);
  if (!set || !line) throw AppError.notFound('The assessment’s requirement set or product line');
  // The limit-by-limit diff against the approved revision this one replaced (recorded at its approval).
  // Without one (the set's first approved revision) every limit is new.
  const baselineId = revision.impact?.baselineRevisionId ?? null;
  const diff = baselineId !== null ? await diffRevision(revision.id, baselineId) : { items: diffRequirements(null, revision.requirements) };
  const baseline = baselineId !== null ? await getRevision(baselineId) : null;
  const result = assessment.result as unknown as Assessment;
  const figures = reportFigures(candidate.design, revision.requirements, result);
  return { candidate, revision, set, line, diff, baseline, result, figures };
}

// ---- use cases --------------------------------------------------------------

export async function issueReport(actor: SessionUser, assessmentId: number, input: IssueReportInput): Promise<ReportRecord> {
  const assessment = await getAssessment(assessmentId);
  await assertSignerPassword(actor, input.password, assessmentId);
  const src = await gatherSources(assessment);
  const { signer, archive } = reportServices();
  const signing = signer.describe();

  const id = await inTransaction(async (t) => {
    const signedAt = new Date();
    const year = signedAt.getUTCFullYear();
    const number = formatReportNumber(year, await reportRepository.nextSequence(year, t));
    const head = await auditRepository.head();
    const content: ReportContent = {
      number,
      signedAt,
      signer: { id: actor.id, name: actor.name, email: actor.email },
      meaning: input.meaning,
      productLine: { id: src.line.id, name: src.line.name },
      requirementSet: { id: src.set.id, name: src.set.name },
      revision: {
        id: src.revision.id,
        number: src.revision.number,
        sha256: src.revision.sha256!,
        requirements: src.revision.requirements,
        rationale: src.revision.rationale,
        approvedAt: src.revision.approvedAt,
        approver: src.revision.approver,
        author: src.revision.author,
        impact: src.revision.impact,
      },
      candidate: { id: src.candidate.id, name: src.candidate.name, notes: src.candidate.notes, design: src.candidate.design },
      assessment: { id: assessment.id, createdAt: assessment.createdAt, createdBy: assessment.createdBy, engineVersion: assessment.engineVersion, result: src.result },
      bounds: src.figures.bounds,
      region: src.figures.region,
      step: src.figures.step,
      diff: { againstRevisionNumber: src.baseline?.number ?? null, items: src.diff.items },
      auditHead: { id: head.lastId, hash: head.lastHash },
      signing: { subject: signing.subject, certificateSha256: signing.certificateSha256 },
    };
    const rendered = await renderReport(content);
    const signed = await signer.sign(rendered.pdf, signedAt);
    const hash = sha256(signed);
    // A key of its own per report: the number and the content hash.
    const key = `reports/${year}/${number}-${hash.slice(0, 16)}.pdf`;
    try {
      await archive.putNew(key, signed, { reportNumber: number });
    } catch (err) {
      if (err instanceof ArchiveConflict) throw AppError.conflict('archive_conflict', err.message);
      throw err;
    }
    const newId = await reportRepository.create(
      {
        number,
        assessmentId: assessment.id,
        candidateId: src.candidate.id,
        productLineId: src.line.id,
        revisionId: src.revision.id,
        verdict: src.result.verdict === 'compliant' ? 'compliant' : 'noncompliant',
        engineVersion: assessment.engineVersion,
        signerId: actor.id,
        signerName: actor.name,
        signerEmail: actor.email,
        meaning: input.meaning,
        signedAt,
        sha256: hash,
        byteSize: signed.length,
        storageBucket: archive.bucket,
        storageKey: key,
        auditHeadId: head.lastId,
        auditHeadHash: head.lastHash,
        signingCertSha256: signing.certificateSha256,
      },
      t,
    );
    await recordAudit(t, actor, {
      action: 'report.issue',
      entityType: 'report',
      entityId: newId,
      productLineId: src.line.id,
      after: { id: newId, number, assessmentId: assessment.id, meaning: input.meaning, signedAt: signedAt.toISOString(), sha256: hash, storageKey: key, auditHeadHash: head.lastHash },
    });
    const auditors = await userRepository.listActiveByRole('auditor');
    await notifyReportIssued(t, {
      reportNumber: number,
      meaning: input.meaning,
      signerName: actor.name,
      candidateName: src.candidate.name,
      productLineName: src.line.name,
      requirementSetName: src.set.name,
      revisionNumber: src.revision.number,
      verdict: src.result.verdict === 'compliant' ? 'compliant' : 'not_compliant',
      sha256: hash,
      link: `/reports?report=${newId}`,
      recipients: auditors.map((u) => ({ email: u.email, name: u.name })),
    });
    return newId;
  });
  return toReportRecord((await reportRepository.findById(id))!);
}

export async function getReport(id: number): Promise<ReportRecord> {
  const report = await reportRepository.findById(id);
  if (!report) throw AppError.notFound('That report');
  return toReportRecord(report);
}

/** The signed file from the archive, checked against its record before it leaves; every download is audited. */
export async function downloadReport(actor: SessionUser, id: number): Promise<{ record: ReportRecord; pdf: Buffer }> {
  const report = await reportRepository.findById(id);
  if (!report) throw AppError.notFound('That report');
  const pdf = await reportServices().archive.get(report.storageKey);
  if (sha256(pdf) !== report.sha256) {
    throw new AppError('archive_mismatch', 'The archived copy of this report does not match its record; it was not sent. Tell your administrator.', 500);
  }
  await inTransaction((t) =>
    recordAudit(t, actor, { action: 'report.download', entityType: 'report', entityId: id, productLineId: report.productLineId, after: { number: report.number, sha256: report.sha256 } }),
  );
  return { record: toReportRecord(report), pdf };
}

export async function listProductLineReports(productLineId: number, limit: number, offset: number): Promise<ListResponse<ReportRecord>> {
  if (!(await productLineRepository.findById(productLineId))) throw AppError.notFound('That product line');
  const { items, total } = await reportRepository.listByProductLine(productLineId, limit, offset);
  return { items: items.map(toReportRecord), total };
}

export async function listCandidateReports(candidateId: number, limit: number, offset: number): Promise<ListResponse<ReportRecord>> {
  await findCandidate(candidateId).catch(() => {
    throw AppError.notFound('That candidate');
  });
  const { items, total } = await reportRepository.listByCandidate(candidateId, limit, offset);
  return { items: items.map(toReportRecord), total };
}

export async function listReports(limit: number, offset: number): Promise<ListResponse<ReportRecord>> {
  const { items, total } = await reportRepository.listAll(limit, offset);
  return { items: items.map(toReportRecord), total };
}

/** A PDF starts with "%PDF-" (ISO 32000-1 §7.5.2); readers allow a little junk before it. */
function assertPdf(file: Buffer): void {
  if (file.subarray(0, 1024).indexOf('%PDF-') < 0) {
    throw AppError.badRequest('not_a_pdf', 'That file is not a PDF (it does not begin like one), so it cannot be a Polecourt report.', { file: 'not a PDF' });
  }
}

export async function verifyReport(actor: SessionUser, file: Buffer): Promise<ReportVerification> {
  assertPdf(file);
  const hash = sha256(file);
  const ours = reportServices().signer.describe().certificateSha256;
  const signature = await verifySignature(file, async (fp) => fp === ours || (await reportRepository.certificateUsed(fp)));
  const intact = signature.present && signature.coversWholeFile && signature.digestMatches && signature.signatureMatches && signature.signedByPolecourt;
  const stored = await reportRepository.findBySha256(hash);
  const issuedHere = stored !== null;
  const recomputed = recompute(readAttachments(file));
  const valid = intact && issuedHere;

  let summary: string;
  if (valid) {
    summary = `This is compliance report ${stored!.number} as Polecourt issued it: the signature is intact and the file is byte for byte the one on record.`;
  } else if (!signature.present) {
    summary = 'This PDF carries no signature, and Polecourt has no report with this content. It is not a Polecourt compliance report.';
  } else if (!intact && !issuedHere) {
    summary = `Not intact and not issued here: ${signature.summary} The file does not match any report Polecourt issued.`;
  } else if (!intact) {
    summary = `Not intact: ${signature.summary}`;
  } else {
    summary = 'The signature is intact, but Polecourt has no record of a report with exactly this content.';
  }
  const { certificateSha256: _omit, ...finding } = signature;
  await inTransaction((t) =>
    recordAudit(t, actor, {
      action: 'report.verify',
      entityType: 'report',
      entityId: stored?.id ?? null,
      productLineId: stored?.productLineId ?? null,
      after: { sha256: hash, valid, intact, issuedHere },
    }),
  );
  return { valid, intact, issuedHere, sha256: hash, report: stored ? toReportRecord(stored) : null, signature: finding, recomputed, summary };
}
