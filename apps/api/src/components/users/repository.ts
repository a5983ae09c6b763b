import { QueryTypes, type Transaction } from 'sequelize';

import type { PublicUser, Role } from '@polecourt/contracts';

import { getSequelize } from '../../lib/transaction.js';
import { UserModel } from './model.js';
import { forgetSessionUser } from './session-user-cache.js';

export interface UserRecord extends PublicUser {
  passwordHash: string | null;
}

type UserRow = Pick<UserModel, 'id' | 'email' | 'name' | 'role' | 'passwordHash' | 'createdAt' | 'lastLoginAt'> & { active: boolean | number };

function toRecord(row: UserModel | UserRow | null | undefined): UserRecord | null {
  if (!row) return null;
  const u: UserRow = row instanceof UserModel ? row.get({ plain: true }) : row;
  return {
    id: Number(u.id),
    email: u.email,
    name: u.name,
    role: u.role,
    active: Boolean(u.active),
    passwordHash: u.passwordHash,
    createdAt: new Date(u.createdAt).toISOString(),
    lastLoginAt: u.lastLoginAt ? new Date(u.lastLoginAt).toISOString() : null,
  };
}

// Every request of a signed-in session loads its user: one plain query
// rather than a model instance keeps that cheap.
async function selectUser(where: 'id' | 'email', value: unknown, transaction?: Transaction): Promise<UserRecord | null> {
  const rows = await getSequelize().query<UserRow>(
    `SELECT id, email, name, role, active, password_hash AS passwordHash, created_at AS createdAt, last_login_at AS lastLoginAt FROM users WHERE ${where} = ?`,
    { replacements: [value], type: QueryTypes.SELECT, transaction },
  );
  return toRecord(rows[0]);
}

export function toPublicUser(u: UserRecord): PublicUser {
  const { passwordHash: _omit, ...rest } = u;
  return rest;
}

export const userRepository = {
  async findByEmail(email: string): Promise<UserRecord | null> {
    return selectUser('email', email.trim().toLowerCase());
  },

  async findById(id: number, transaction?: Transaction): Promise<UserRecord | null> {
    return selectUser('id', id, transaction);
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
    forgetSessionUser(id);
    await UserModel.update(changes, { where: { id }, transaction });
    return selectUser('id', id, transaction);
  },

  async countActiveAdmins(transaction?: Transaction): Promise<number> {
    return UserModel.count({ where: { role: 'admin', active: true }, transaction });
  },
};
