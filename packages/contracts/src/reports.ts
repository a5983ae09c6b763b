import { z } from 'zod';

import { SIGNATURE_MEANINGS, type PersonRef, type SignatureMeaning } from './workflow.js';

// Compliance reports: issuing one (an electronic signature with a stated
// meaning, the password re-entered at signing), the stored record, and the
// answer of "verify a report".

export const REPORT_MEANING_LABELS: Record<SignatureMeaning, string> = {
  reviewed: 'Reviewed',
  released: 'Released',
};

/** What the signer states by signing, printed in the signature block (21 CFR Part 11 §11.50). */
export const REPORT_MEANING_STATEMENTS: Record<SignatureMeaning, string> = {
  reviewed: 'I have reviewed this assessment, its inputs and its results.',
  released: 'I release this assessment as the record of the candidate against this revision.',
};

export const issueReportSchema = z
  .object({
    password: z.string({ message: 'Re-enter your password to sign' }).min(1, 'Re-enter your password to sign').max(200, 'Password is too long'),
    meaning: z.enum(SIGNATURE_MEANINGS, { message: `Say what your signature means: ${SIGNATURE_MEANINGS.join(' or ')}` }),
  })
  .strict();
export type IssueReportInput = z.infer<typeof issueReportSchema>;

/** Largest PDF accepted by "verify a report". */
export const VERIFY_REPORT_MAX_BYTES = 10 * 1024 * 1024;

export interface ReportRecord {
  id: number;
  /** Polecourt's report number, e.g. PCR-2026-000123. */
  number: string;
  assessmentId: number;
  candidateId: number;
  candidateName: string;
  productLineId: number;
  productLineName: string;
  requirementSetId: number;
  requirementSetName: string;
  revisionId: number;
  revisionNumber: number;
  revisionSha256: string;
  verdict: 'compliant' | 'noncompliant';
  engineVersion: string;
  /** The signer as printed in the report (name and e-mail at the time of signing). */
  signer: PersonRef;
  meaning: SignatureMeaning;
  /** UTC, ISO 8601. */
  signedAt: string;
  /** SHA-256 of the signed PDF file, hex. */
  sha256: string;
  byteSize: number;
  /** The audit-chain head hash printed in the report. */
  auditHeadHash: string;
}

export interface RecomputedCheck {
  requirement: string;
  stored: number | null;
  now: number | null;
  /** |now - stored| / max(|stored|, tiny); null when either side has no value. */
  relativeDifference: number | null;
  storedStatus: string;
  nowStatus: string;
}

export interface RecomputeResult {
  /** False when the file carries no readable inputs (not a Polecourt report, or damaged). */
  available: boolean;
  reason?: string;
  engineVersionThen?: string;
  engineVersionNow?: string;
  sameEngine?: boolean;
  verdictThen?: string | null;
  verdictNow?: string | null;
  /** Every number agrees to the engine's stated precision (1e-6 relative) and every status and the verdict are the same. */
  agrees?: boolean;
  /** The largest relative difference over the metrics and the checks. */
  maxRelativeDifference?: number;
  checks?: RecomputedCheck[];
}

export interface SignatureFinding {
  /** The file has a PDF signature dictionary with a byte range and contents. */
  present: boolean;
  /** The signed byte ranges cover the whole file except the signature itself. */
  coversWholeFile: boolean;
  /** The CMS message-digest attribute equals the SHA-256 of the signed byte ranges. */
  digestMatches: boolean;
  /** The CMS signature verifies with the certificate it carries. */
  signatureMatches: boolean;
  /** That certificate is one Polecourt signs with. */
  signedByPolecourt: boolean;
  signerCertificate: string | null;
  /** Plain words: what was found. */
  summary: string;
}

export interface ReportVerification {
  /** intact && issuedHere. */
  valid: boolean;
  /** The signature verifies over the byte range with Polecourt's certificate. */
  intact: boolean;
  /** The file's SHA-256 equals the one of a report Polecourt issued. */
  issuedHere: boolean;
  /** SHA-256 of the uploaded file, hex. */
  sha256: string;
  report: ReportRecord | null;
  signature: SignatureFinding;
  recomputed: RecomputeResult;
  /** One or two sentences for a person. */
  summary: string;
}
