import { QueryTypes, type Transaction } from 'sequelize';

import type { Role } from '@polecourt/contracts';

import { getSequelize } from '../../lib/transaction.js';

export interface ApiTokenRecord {
  id: number;
  userId: number;
  name: string;
  prefix: string;
  createdAt: Date;
  lastUsedAt: Date | null;
  expiresAt: Date;
  revokedAt: Date | null;
  revokedBy: number | null;
  owner: { id: number; name: string; email: string; role: Role; active: boolean };
}

interface Row {
  id: number;
  user_id: number;
  name: string;
  prefix: string;
  created_at: Date;
  last_used_at: Date | null;
  expires_at: Date;
  revoked_at: Date | null;
  revoked_by: number | null;
  owner_name: string;
  owner_email: string;
  owner_role: Role;
  owner_active: number | boolean;
}

const SELECT = `SELECT t.id, t.user_id, t.name, t.prefix, t.created_at, t.last_used_at, t.expires_at, t.revoked_at, t.revoked_by,
  u.name AS owner_name, u.email AS owner_email, u.role AS owner_role, u.active AS owner_active
  FROM api_tokens t JOIN users u ON u.id = t.user_id`;

const date = (v: Date | string | null): Date | null => (v === null ? null : new Date(v));

function toRecord(r: Row): ApiTokenRecord {
  return {
    id: Number(r.id),
    userId: Number(r.user_id),
    name: r.name,
    prefix: r.prefix,
    createdAt: date(r.created_at)!,
    lastUsedAt: date(r.last_used_at),
    expiresAt: date(r.expires_at)!,
    revokedAt: date(r.revoked_at),
    revokedBy: r.revoked_by === null ? null : Number(r.revoked_by),
    owner: { id: Number(r.user_id), name: r.owner_name, email: r.owner_email, role: r.owner_role, active: Boolean(r.owner_active) },
  };
}

async function one(where: string, replacements: unknown[], transaction?: Transaction): Promise<ApiTokenRecord | null> {
  const rows = await getSequelize().query<Row>(`${SELECT} WHERE ${where} LIMIT 1`, { replacements, type: QueryTypes.SELECT, transaction });
  return rows[0] ? toRecord(rows[0]) : null;
}

export const apiTokenRepository = {
  async create(
    data: { userId: number; name: string; tokenHash: string; prefix: string; createdAt: Date; expiresAt: Date },
    transaction: Transaction,
  ): Promise<ApiTokenRecord> {
    const [id] = await getSequelize().query('INSERT INTO api_tokens (user_id, name, token_hash, prefix, created_at, expires_at) VALUES (?, ?, ?, ?, ?, ?)', {
      replacements: [data.userId, data.name, data.tokenHash, data.prefix, data.createdAt, data.expiresAt],
      type: QueryTypes.INSERT,
      transaction,
    });
    return (await one('t.id = ?', [id], transaction))!;
  },

  findByHash(tokenHash: string): Promise<ApiTokenRecord | null> {
    return one('t.token_hash = ?', [tokenHash]);
  },

  findById(id: number, transaction?: Transaction): Promise<ApiTokenRecord | null> {
    return one('t.id = ?', [id], transaction);
  },

  async list(userId: number | null, limit: number, offset: number): Promise<{ items: ApiTokenRecord[]; total: number }> {
    const sequelize = getSequelize();
    const where = userId === null ? '' : 'WHERE t.user_id = ?';
    const args = userId === null ? [] : [userId];
    const rows = await sequelize.query<Row>(`${SELECT} ${where} ORDER BY t.id DESC LIMIT ? OFFSET ?`, { replacements: [...args, limit, offset], type: QueryTypes.SELECT });
    const [count] = await sequelize.query<{ n: number }>(`SELECT COUNT(*) AS n FROM api_tokens t ${where}`, { replacements: args, type: QueryTypes.SELECT });
    return { items: rows.map(toRecord), total: Number(count?.n ?? 0) };
  },

  async revoke(id: number, by: number, at: Date, transaction: Transaction): Promise<boolean> {
    const [, affected] = await getSequelize().query('UPDATE api_tokens SET revoked_at = ?, revoked_by = ? WHERE id = ? AND revoked_at IS NULL', {
      replacements: [at, by, id],
      type: QueryTypes.UPDATE,
      transaction,
    });
    return Number(affected) === 1;
  },

  /**
   * Marks the token used unless that was already done within `gapMs`; true
   * when this call did it. The condition lives in the UPDATE, so several API
   * processes agree on who records the use.
   */
  async touch(id: number, at: Date, gapMs: number, transaction: Transaction): Promise<boolean> {
    const [, affected] = await getSequelize().query('UPDATE api_tokens SET last_used_at = ? WHERE id = ? AND (last_used_at IS NULL OR last_used_at <= ?)', {
      replacements: [at, id, new Date(at.getTime() - gapMs)],
      type: QueryTypes.UPDATE,
      transaction,
    });
    return Number(affected) === 1;
  },
};
