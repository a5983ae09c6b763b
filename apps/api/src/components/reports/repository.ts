import { QueryTypes, type Transaction } from 'sequelize';

import type { SignatureMeaning } from '@polecourt/contracts';

import { getSequelize } from '../../lib/transaction.js';

// Reports are written once and read many times; plain SQL keeps the row
// shape in one place and no ORM instance leaves this file.

export interface StoredReport {
  id: number;
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
  signerId: number;
  signerName: string;
  signerEmail: string;
  meaning: SignatureMeaning;
  signedAt: string;
  sha256: string;
  byteSize: number;
  storageBucket: string;
  storageKey: string;
  auditHeadId: number | null;
  auditHeadHash: string;
  signingCertSha256: string;
  createdAt: string;
}

export interface NewReport {
  number: string;
  assessmentId: number;
  candidateId: number;
  productLineId: number;
  revisionId: number;
  verdict: string;
  engineVersion: string;
  signerId: number;
  signerName: string;
  signerEmail: string;
  meaning: SignatureMeaning;
  signedAt: Date;
  sha256: string;
  byteSize: number;
  storageBucket: string;
  storageKey: string;
  auditHeadId: number | null;
  auditHeadHash: string;
  signingCertSha256: string;
}

interface Row {
  id: number;
  number: string;
  assessment_id: number;
  candidate_id: number;
  candidate_name: string;
  product_line_id: number;
  product_line_name: string;
  requirement_set_id: number;
  requirement_set_name: string;
  revision_id: number;
  revision_number: number;
  revision_sha256: string | null;
  verdict: string;
  engine_version: string;
  signer_id: number;
  signer_name: string;
  signer_email: string;
  meaning: string;
  signed_at: Date | string;
  sha256: string;
  byte_size: number;
  storage_bucket: string;
  storage_key: string;
  audit_head_id: number | null;
  audit_head_hash: string;
  signing_cert_sha256: string;
  created_at: Date | string;
}

const SELECT = `SELECT r.*, c.name AS candidate_name, p.name AS product_line_name, s.id AS requirement_set_id,
       s.name AS requirement_set_name, v.number AS revision_number, v.sha256 AS revision_sha256
  FROM reports r
  JOIN candidates c ON c.id = r.candidate_id
  JOIN product_lines p ON p.id = r.product_line_id
  JOIN revisions v ON v.id = r.revision_id
  JOIN requirement_sets s ON s.id = v.requirement_set_id`;

function toStored(r: Row): StoredReport {
  return {
    id: Number(r.id),
    number: r.number,
    assessmentId: Number(r.assessment_id),
    candidateId: Number(r.candidate_id),
    candidateName: r.candidate_name,
    productLineId: Number(r.product_line_id),
    productLineName: r.product_line_name,
    requirementSetId: Number(r.requirement_set_id),
    requirementSetName: r.requirement_set_name,
    revisionId: Number(r.revision_id),
    revisionNumber: Number(r.revision_number),
    revisionSha256: r.revision_sha256 ?? '',
    verdict: r.verdict === 'compliant' ? 'compliant' : 'noncompliant',
    engineVersion: r.engine_version,
    signerId: Number(r.signer_id),
    signerName: r.signer_name,
    signerEmail: r.signer_email,
    meaning: r.meaning as SignatureMeaning,
    signedAt: new Date(r.signed_at).toISOString(),
    sha256: r.sha256,
    byteSize: Number(r.byte_size),
    storageBucket: r.storage_bucket,
    storageKey: r.storage_key,
    auditHeadId: r.audit_head_id === null ? null : Number(r.audit_head_id),
    auditHeadHash: r.audit_head_hash,
    signingCertSha256: r.signing_cert_sha256,
    createdAt: new Date(r.created_at).toISOString(),
  };
}

async function select(where: string, replacements: Record<string, unknown>, tail = '', transaction?: Transaction): Promise<StoredReport[]> {
  const rows = await getSequelize().query<Row>(`${SELECT} WHERE ${where} ${tail}`, { replacements, type: QueryTypes.SELECT, transaction });
  return rows.map(toStored);
}

async function count(where: string, replacements: Record<string, unknown>): Promise<number> {
  const [row] = await getSequelize().query<{ n: number }>(`SELECT COUNT(*) AS n FROM reports r WHERE ${where}`, { replacements, type: QueryTypes.SELECT });
  return Number(row?.n ?? 0);
}

export const reportRepository = {
  /**
   * The next number of the year, under the counter row's lock: concurrent
   * signers line up, and a rolled-back signing gives its number back.
   */
  async nextSequence(year: number, transaction: Transaction): Promise<number> {
    const sequelize = getSequelize();
    await sequelize.query('INSERT INTO report_counters (year, last_value) VALUES (:year, 1) ON DUPLICATE KEY UPDATE last_value = last_value + 1', {
      replacements: { year },
      transaction,
    });
    const [row] = await sequelize.query<{ last_value: number }>('SELECT last_value FROM report_counters WHERE year = :year FOR UPDATE', {
      replacements: { year },
      type: QueryTypes.SELECT,
      transaction,
    });
    return Number(row!.last_value);
  },

  async create(data: NewReport, transaction: Transaction): Promise<number> {
    const [id] = await getSequelize().query(
      `INSERT INTO reports (number, assessment_id, candidate_id, product_line_id, revision_id, verdict, engine_version, signer_id,
         signer_name, signer_email, meaning, signed_at, sha256, byte_size, storage_bucket, storage_key, audit_head_id, audit_head_hash,
         signing_cert_sha256, created_at)
       VALUES (:number, :assessmentId, :candidateId, :productLineId, :revisionId, :verdict, :engineVersion, :signerId,
         :signerName, :signerEmail, :meaning, :signedAt, :sha256, :byteSize, :storageBucket, :storageKey, :auditHeadId, :auditHeadHash,
         :signingCertSha256, :createdAt)`,
      { replacements: { ...data, createdAt: new Date() }, type: QueryTypes.INSERT, transaction },
    );
    return Number(id);
  },

  async findById(id: number, transaction?: Transaction): Promise<StoredReport | null> {
    return (await select('r.id = :id', { id }, '', transaction))[0] ?? null;
  },

  async findBySha256(sha256: string): Promise<StoredReport | null> {
    return (await select('r.sha256 = :sha256', { sha256 }))[0] ?? null;
  },

  async findByNumber(number: string): Promise<StoredReport | null> {
    return (await select('r.number = :number', { number }))[0] ?? null;
  },

  async listByProductLine(productLineId: number, limit: number, offset: number): Promise<{ items: StoredReport[]; total: number }> {
    const items = await select('r.product_line_id = :productLineId', { productLineId, limit, offset }, 'ORDER BY r.id DESC LIMIT :limit OFFSET :offset');
    return { items, total: await count('r.product_line_id = :productLineId', { productLineId }) };
  },

  async listByCandidate(candidateId: number, limit: number, offset: number): Promise<{ items: StoredReport[]; total: number }> {
    const items = await select('r.candidate_id = :candidateId', { candidateId, limit, offset }, 'ORDER BY r.id DESC LIMIT :limit OFFSET :offset');
    return { items, total: await count('r.candidate_id = :candidateId', { candidateId }) };
  },

  async listAll(limit: number, offset: number): Promise<{ items: StoredReport[]; total: number }> {
    const items = await select('1 = 1', { limit, offset }, 'ORDER BY r.id DESC LIMIT :limit OFFSET :offset');
    return { items, total: await count('1 = 1', {}) };
  },

  /** Whether any report was signed with the certificate of this SHA-256 fingerprint. */
  async certificateUsed(fingerprint: string): Promise<boolean> {
    return (await count('r.signing_cert_sha256 = :fingerprint', { fingerprint })) > 0;
  },
};
