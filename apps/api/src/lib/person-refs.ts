import { QueryTypes, type Transaction } from 'sequelize';

import type { PersonRef } from '@polecourt/contracts';

import { getSequelize } from './transaction.js';

/** Names and e-mails of the given users, for the author/approver/creator fields of responses. */
export async function personRefs(ids: (number | null | undefined)[], transaction?: Transaction): Promise<Map<number, PersonRef>> {
  const wanted = [...new Set(ids.filter((id): id is number => typeof id === 'number'))];
  const out = new Map<number, PersonRef>();
  if (wanted.length === 0) return out;
  const rows = await getSequelize().query<PersonRef>('SELECT id, name, email FROM users WHERE id IN (:ids)', {
    replacements: { ids: wanted },
    type: QueryTypes.SELECT,
    transaction,
  });
  for (const r of rows) out.set(Number(r.id), { id: Number(r.id), name: r.name, email: r.email });
  return out;
}

/** A user that was since removed still shows as someone, never as a crash. */
export function personOrUnknown(map: Map<number, PersonRef>, id: number | null): PersonRef | null {
  if (id === null) return null;
  return map.get(id) ?? { id, name: 'Unknown user', email: '' };
}
