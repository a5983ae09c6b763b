import { describe, expect, it } from 'vitest';

import type { UserRecord } from './repository.js';
import { forgetSessionUser, sessionUser } from './session-user-cache.js';

function record(id: number, over: Partial<UserRecord> = {}): UserRecord {
  return { id, email: `u${id}@example.com`, name: `User ${id}`, role: 'auditor', active: true, ...over } as UserRecord;
}

/** A loader that answers when told to, counting its calls. */
function gatedLoader(answer: (id: number) => UserRecord | null) {
  const gates: (() => void)[] = [];
  let calls = 0;
  const load = (id: number) => {
    calls++;
    return new Promise<UserRecord | null>((resolve) => gates.push(() => resolve(answer(id))));
  };
  return { load, open: () => gates.splice(0).forEach((g) => g()), calls: () => calls };
}

describe('sessionUser', () => {
  it('When 20 requests of one user arrive while nothing is kept, then the user is read once and all get it', async () => {
    const l = gatedLoader((id) => record(id));
    const pending = Array.from({ length: 20 }, () => sessionUser(9001, l.load));
    expect(l.calls()).toBe(1);
    l.open();
    const users = await Promise.all(pending);
    expect(users.every((u) => u?.email === 'u9001@example.com')).toBe(true);
    // and kept: the next one reads nothing
    await sessionUser(9001, l.load);
    expect(l.calls()).toBe(1);
  });

  it('When the account changes while it is being read, then the read is not kept and the next request reads again', async () => {
    let active = true;
    const l = gatedLoader((id) => record(id, { active }));
    const first = sessionUser(9002, l.load);
    active = false;
    forgetSessionUser(9002); // the deactivation, before the first read came back
    const second = sessionUser(9002, l.load);
    expect(l.calls()).toBe(2);
    l.open();
    expect(await second).toBeNull();
    await first;
    expect(await sessionUser(9002, l.load)).toBeNull();
    expect(l.calls()).toBe(2);
  });

  it('When the account is unknown or deactivated, then null', async () => {
    expect(await sessionUser(9003, async () => null)).toBeNull();
    expect(await sessionUser(9004, async (id) => record(id, { active: false }))).toBeNull();
  });
});
