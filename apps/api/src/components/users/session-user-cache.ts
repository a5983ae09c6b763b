import { KeptReads } from '../../lib/kept-reads.js';
import type { SessionUser } from '../../lib/request-context.js';
import type { UserRecord } from './repository.js';

// Every request of a signed-in session (or an API token) needs its user
// (role, still active?). A read is kept for one second, so a busy client's
// burst reads it once, and requests in flight share one read. A change to
// the account drops it (users repository), but the change commits later and
// other API processes keep theirs: a deactivation or a new role takes effect
// everywhere within about a second.
const users = new KeptReads<number, SessionUser | null>({ max: 10_000, ttlMs: 1000 });

/** The active user with this id, or null (unknown or deactivated). */
export function sessionUser(id: number, load: (id: number) => Promise<UserRecord | null>): Promise<SessionUser | null> {
  return users.get(id, async () => {
    const u = await load(id);
    return u && u.active ? { id: u.id, email: u.email, name: u.name, role: u.role } : null;
  });
}

/** Called on every change to an account (role, active, name, password). */
export function forgetSessionUser(id: number): void {
  users.forget(id);
}
