import type { Transaction } from 'sequelize';

import type { PublicUser, Role } from '@polecourt/contracts';

import { UserModel } from './model.js';

export interface UserRecord extends PublicUser {
  passwordHash: string | null;
}

function toRecord(row: UserModel | null): UserRecord | null {
  if (!row) return null;
  const u = row.get({ plain: true });
  return {
    id: u.id,
    email: u.email,
    name: u.name,
    role: u.role,
    active: Boolean(u.active),
    passwordHash: u.passwordHash,
    createdAt: new Date(u.createdAt).toISOString(),
    lastLoginAt: u.lastLoginAt ? new Date(u.lastLoginAt).toISOString() : null,
  };
}

export function toPublicUser(u: UserRecord): PublicUser {
  const { passwordHash: _omit, ...rest } = u;
  return rest;
}

export const userRepository = {
  async findByEmail(email: string): Promise<UserRecord | null> {
    return toRecord(await UserModel.findOne({ where: { email: email.trim().toLowerCase() } }));
  },

  async findById(id: number, transaction?: Transaction): Promise<UserRecord | null> {
    return toRecord(await UserModel.findByPk(id, { transaction }));
  },

  async list(limit: number, offset: number): Promise<{ items: UserRecord[]; total: number }> {
    const { rows, count } = await UserModel.findAndCountAll({ order: [['name', 'ASC'], ['id', 'ASC']], limit, offset });
    return { items: rows.map((r) => toRecord(r)!), total: count };
  },

  async listActiveByRole(role: Role): Promise<UserRecord[]> {
    const rows = await UserModel.findAll({ where: { role, active: true }, order: [['id', 'ASC']] });
    return rows.map((r) => toRecord(r)!);
  },

  async create(
    data: { email: string; name: string; role: Role; passwordHash: string | null },
    transaction?: Transaction,
  ): Promise<UserRecord> {
    const row = await UserModel.create({ ...data, email: data.email.toLowerCase(), lastLoginAt: null }, { transaction });
    return toRecord(row)!;
  },

  async update(
    id: number,
    changes: Partial<{ name: string; role: Role; active: boolean; passwordHash: string; lastLoginAt: Date }>,
    transaction?: Transaction,
  ): Promise<UserRecord | null> {
    await UserModel.update(changes, { where: { id }, transaction });
    return toRecord(await UserModel.findByPk(id, { transaction }));
  },

  async countActiveAdmins(transaction?: Transaction): Promise<number> {
    return UserModel.count({ where: { role: 'admin', active: true }, transaction });
  },
};
