import { Op, type Transaction } from 'sequelize';

import { PasswordTokenModel, type TokenPurpose } from './model.js';

export interface PasswordTokenRecord {
  id: number;
  userId: number;
  purpose: TokenPurpose;
  expiresAt: Date;
  usedAt: Date | null;
  revokedAt: Date | null;
  createdAt: Date;
}

function toRecord(row: PasswordTokenModel | null): PasswordTokenRecord | null {
  if (!row) return null;
  const r = row.get({ plain: true });
  return {
    id: r.id,
    userId: r.userId,
    purpose: r.purpose,
    expiresAt: new Date(r.expiresAt),
    usedAt: r.usedAt ? new Date(r.usedAt) : null,
    revokedAt: r.revokedAt ? new Date(r.revokedAt) : null,
    createdAt: new Date(r.createdAt),
  };
}

export const passwordTokenRepository = {
  async create(
    data: { userId: number; purpose: TokenPurpose; tokenHash: string; expiresAt: Date; createdBy: number | null },
    transaction: Transaction,
  ): Promise<PasswordTokenRecord> {
    const row = await PasswordTokenModel.create({ ...data, usedAt: null, revokedAt: null }, { transaction });
    return toRecord(row)!;
  },

  /** Locks the row so two uses of one link line up and only the first wins. */
  async findByHashForUpdate(tokenHash: string, transaction: Transaction): Promise<PasswordTokenRecord | null> {
    return toRecord(await PasswordTokenModel.findOne({ where: { tokenHash }, transaction, lock: transaction.LOCK.UPDATE }));
  },

  async markUsed(id: number, at: Date, transaction: Transaction): Promise<void> {
    await PasswordTokenModel.update({ usedAt: at }, { where: { id }, transaction });
  },

  /** Revokes the user's open tokens (of one purpose, or all); returns how many. */
  async revokeOpen(userId: number, purpose: TokenPurpose | null, at: Date, transaction: Transaction): Promise<number> {
    const [count] = await PasswordTokenModel.update(
      { revokedAt: at },
      { where: { userId, usedAt: null, revokedAt: null, ...(purpose ? { purpose } : {}) }, transaction },
    );
    return count;
  },

  /** The newest open token of this purpose created after `since`, if any. */
  async findRecentOpen(userId: number, purpose: TokenPurpose, since: Date, transaction: Transaction): Promise<PasswordTokenRecord | null> {
    return toRecord(
      await PasswordTokenModel.findOne({
        where: { userId, purpose, usedAt: null, revokedAt: null, createdAt: { [Op.gt]: since }, expiresAt: { [Op.gt]: new Date() } },
        order: [['id', 'DESC']],
        transaction,
      }),
    );
  },
};
