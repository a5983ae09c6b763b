import LRUCache from 'lru-cache';

import type { SessionUser } from '../../lib/request-context.js';
import type { UserRecord } from './repository.js';

// Every request of a signed-in session needs its user (role, still active?).
// A read is kept for one second, so a busy client's burst reads it once. A
// change to the account drops it (users repository), but the change commits
// later and other API processes keep theirs: a deactivation or a new role
// takes effect everywhere within about a second.
const kept = new LRUCache<number, { user: SessionUser | null }>({ max: 10_000, ttl: 1000 });

/** The active user with this id, or null (unknown or deactivated). */
export async function sessionUser(id: number, load: (id: number) => Promise<UserRecord | null>): Promise<SessionUser | null> {
  const hit = kept.get(id);
  if (hit) return hit.user;
  const u = await load(id);
  const user = u && u.active ? { id: u.id, email: u.email, name: u.name, role: u.role } : null;
  kept.set(id, { user });
  return user;
}

/** Called on every change to an account (role, active, name, password). */
export function forgetSessionUser(id: number): void {
  kept.delete(id);
}
