// The session store's shared reads: concurrent requests of one session wait
// on one query, and a sign-out is never answered from a read that began before it.
import type { SessionData } from 'express-session';
import type { Sequelize } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { LeanSessionStore } from '../src/lib/session-store.js';
import { startTestServer, stopTestServer } from './helpers/server.js';

let sequelize: Sequelize;
let store: LeanSessionStore;
beforeAll(async () => {
  sequelize = (await startTestServer()).sequelize;
  store = new LeanSessionStore({ db: sequelize, tableName: 'sessions', checkExpirationInterval: 3_600_000, expiration: 3_600_000 });
});
afterAll(async () => {
  store.stopExpiringSessions();
  await stopTestServer();
});

const data = (userId: number) => ({ cookie: { originalMaxAge: 3_600_000, expires: new Date(Date.now() + 3_600_000) }, userId, csrfToken: 't' }) as unknown as SessionData;
const get = (sid: string) => new Promise<SessionData | null | undefined>((resolve, reject) => store.get(sid, (err, s) => (err ? reject(err) : resolve(s))));
const set = (sid: string, s: SessionData) => new Promise<void>((resolve, reject) => store.set(sid, s, (err) => (err ? reject(err) : resolve())));
const destroy = (sid: string) => new Promise<void>((resolve, reject) => store.destroy(sid, (err) => (err ? reject(err) : resolve())));

/** Counts the session reads sequelize is asked for while fn runs. */
async function countReads(fn: () => Promise<unknown>): Promise<number> {
  const query = sequelize.query.bind(sequelize);
  let reads = 0;
  (sequelize as unknown as { query: typeof query }).query = ((sql: string, ...rest: unknown[]) => {
    if (typeof sql === 'string' && sql.startsWith('SELECT data FROM sessions')) reads++;
    return (query as (...a: unknown[]) => unknown)(sql, ...rest);
  }) as typeof query;
  try {
    await fn();
  } finally {
    (sequelize as unknown as { query: typeof query }).query = query;
  }
  return reads;
}

describe('LeanSessionStore.get', () => {
  it('When 30 requests of one session arrive with nothing kept, then one query answers them all', async () => {
    const sid = `shared-${Date.now()}`;
    await set(sid, data(1));
    let sessions: (SessionData | null | undefined)[] = [];
    const reads = await countReads(async () => {
      sessions = await Promise.all(Array.from({ length: 30 }, () => get(sid)));
    });
    expect(reads).toBe(1);
    expect(sessions.map((s) => s?.userId)).toEqual(Array(30).fill(1));
    // each caller gets its own copy (express-session changes what it gets)
    expect(new Set(sessions).size).toBe(30);
  });

  it('When the session is destroyed while a read is under way, then a get after the sign-out is not answered by that read', async () => {
    const sid = `signout-${Date.now()}`;
    await set(sid, data(2));
    // The first read's answer is held back until after the sign-out, as on a busy database.
    const query = sequelize.query.bind(sequelize);
    let release!: () => void;
    const held = new Promise<void>((r) => (release = r));
    let first = true;
    (sequelize as unknown as { query: typeof query }).query = ((sql: string, ...rest: unknown[]) => {
      const answer = (query as (...a: unknown[]) => Promise<unknown>)(sql, ...rest);
      if (first && typeof sql === 'string' && sql.startsWith('SELECT data FROM sessions')) {
        first = false;
        return answer.then(async (rows) => {
          await held;
          return rows;
        });
      }
      return answer;
    }) as typeof query;
    try {
      const before = get(sid);
      await destroy(sid);
      const after = get(sid);
      release();
      expect((await before)?.userId).toBe(2); // began before the sign-out: it may see the session
      expect(await after).toBeNull();
      expect(await get(sid)).toBeNull();
    } finally {
      (sequelize as unknown as { query: typeof query }).query = query;
    }
  });
});
