import { QueryTypes, type Transaction } from 'sequelize';

import type { Role } from '@polecourt/contracts';

import { getSequelize } from '../../lib/transaction.js';

export interface Person {
  id: number;
  email: string;
  name: string;
}

export interface SetContext {
  productLineId: number;
  productLineName: string;
  requirementSetId: number;
  requirementSetName: string;
}

// Who hears about what. Only active accounts: a deactivated person gets no mail.
export const noticeRepository = {
  async activeByRoles(roles: Role[], t?: Transaction): Promise<Person[]> {
    if (roles.length === 0) return [];
    const rows = await getSequelize().query<Person>('SELECT id, email, name FROM users WHERE active = 1 AND role IN (:roles) ORDER BY id', {
      replacements: { roles },
      type: QueryTypes.SELECT,
      transaction: t,
    });
    return rows.map((r) => ({ id: Number(r.id), email: r.email, name: r.name }));
  },

  /**
   * The product line's engineers: the active people who have worked on it
   * (created it or one of its requirement sets, wrote or approved one of its
   * revisions, submitted one of its candidates). Polecourt has no line
   * membership list; this is who the line's records name.
   */
  async engineersOfLine(productLineId: number, t?: Transaction): Promise<(Person & { role: Role })[]> {
    const rows = await getSequelize().query<Person & { role: Role }>(
      `SELECT u.id, u.email, u.name, u.role FROM users u
        WHERE u.active = 1 AND u.role <> 'auditor' AND u.id IN (
          SELECT created_by FROM product_lines WHERE id = :line
          UNION SELECT created_by FROM requirement_sets WHERE product_line_id = :line
          UNION SELECT r.author_id FROM revisions r JOIN requirement_sets s ON s.id = r.requirement_set_id WHERE s.product_line_id = :line
          UNION SELECT r.approver_id FROM revisions r JOIN requirement_sets s ON s.id = r.requirement_set_id WHERE s.product_line_id = :line
          UNION SELECT created_by FROM candidates WHERE product_line_id = :line)
        ORDER BY u.id`,
      { replacements: { line: productLineId }, type: QueryTypes.SELECT, transaction: t },
    );
    return rows.map((r) => ({ id: Number(r.id), email: r.email, name: r.name, role: r.role }));
  },

  /** Each candidate's submitter, when that account is still active. */
  async ownersOf(candidateIds: number[], t?: Transaction): Promise<Map<number, Person>> {
    if (candidateIds.length === 0) return new Map();
    const rows = await getSequelize().query<Person & { candidateId: number }>(
      `SELECT c.id AS candidateId, u.id, u.email, u.name FROM candidates c JOIN users u ON u.id = c.created_by
        WHERE c.id IN (:ids) AND u.active = 1`,
      { replacements: { ids: candidateIds }, type: QueryTypes.SELECT, transaction: t },
    );
    return new Map(rows.map((r) => [Number(r.candidateId), { id: Number(r.id), email: r.email, name: r.name }]));
  },

  async setContext(requirementSetId: number, t?: Transaction): Promise<SetContext | null> {
    const [row] = await getSequelize().query<{ lineId: number; lineName: string; setId: number; setName: string }>(
      `SELECT p.id AS lineId, p.name AS lineName, s.id AS setId, s.name AS setName
         FROM requirement_sets s JOIN product_lines p ON p.id = s.product_line_id WHERE s.id = ?`,
      { replacements: [requirementSetId], type: QueryTypes.SELECT, transaction: t },
    );
    if (!row) return null;
    return { productLineId: Number(row.lineId), productLineName: row.lineName, requirementSetId: Number(row.setId), requirementSetName: row.setName };
  },
};
