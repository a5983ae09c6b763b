import LRUCache from 'lru-cache';

import type { SessionUser } from '../../lib/request-context.js';
import type { UserRecord } from './repository.js';

// Every request of a signed-in session needs its user (role, still active?).
// A read is kept for one second, so a busy client's burst reads it once. A
// change to the account drops it (users repository), but the change commits
// later and other API processes keep theirs: a deactivation or a new role
// takes effect everywhere within about a second.
const kept = new LRUCache<number, { user: SessionUser | null }>({ max: 10_000, ttl: 1000 });
// Concurrent requests of one user share one read when the kept copy has run out.
const loading = new Map<number, Promise<SessionUser | null>>();

/** The active user with this id, or null (unknown or deactivated). */
export function sessionUser(id: number, load: (id: number) => Promise<UserRecord | null>): Promise<SessionUser | null> {
  const hit = kept.get(id);
  if (hit) return Promise.resolve(hit.user);
  let read = loading.get(id);
  if (!read) {
    read = load(id)
      .then((u) => {
        const user = u && u.active ? { id: u.id, email: u.email, name: u.name, role: u.role } : null;
        // Not kept if the account changed meanwhile (forgetSessionUser dropped this read).
        if (loading.get(id) === read) kept.set(id, { user });
        return user;
      })
      .finally(() => {
        if (loading.get(id) === read) loading.delete(id);
      });
    loading.set(id, read);
  }
  return read;
}

/** Called on every change to an account (role, active, name, password). */
export function forgetSessionUser(id: number): void {
  kept.delete(id);
  loading.delete(id);
}
