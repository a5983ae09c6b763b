import ConnectSessionSequelize from 'connect-session-sequelize';
import session, { type SessionData } from 'express-session';
import LRUCache from 'lru-cache';
import { QueryTypes, type Sequelize } from 'sequelize';

import { KeptReads } from './kept-reads.js';

/**
 * connect-session-sequelize with its two per-request calls made lean: every
 * request reads its session (get) and, with a rolling cookie, extends it
 * (touch). The package does both through model instances (about 0.8 ms of
 * CPU each on a small machine); here they are one plain query, and a touch
 * is written at most once per `touchEveryMs` per session and process, since
 * moving an expiry of hours by a few seconds is not worth a write. Writing a
 * new or changed session (set) and destroying one stay the package's.
 *
 * A read is kept for `readCacheMs` (1 s by default, lib/kept-reads.ts): a busy
 * client's burst of requests reads its session once, and concurrent reads of
 * one session share one query. Writing or destroying a session in this
 * process drops the kept copy (and a read under way) at once; another API
 * process sees a sign-out within that second.
 *
 * get() also refuses a row past its expiry: the package leaves that to its
 * clean-up timer, so a copied cookie would otherwise outlive its session by
 * up to one clean-up interval.
 */
const SequelizeStore = ConnectSessionSequelize(session.Store);

export interface LeanSessionStoreOptions {
  db: Sequelize;
  tableName: string;
  checkExpirationInterval: number;
  expiration: number;
  touchEveryMs?: number;
  readCacheMs?: number;
}

/** Sessions remembered per process; bounded so a flood of sessions cannot grow memory. */
const MAX_REMEMBERED = 50_000;

export class LeanSessionStore extends SequelizeStore {
  private readonly db: Sequelize;
  private readonly table: string;
  private readonly expirationMs: number;
  /** Sessions whose expiry was written within the last touchEveryMs. */
  private readonly touched: LRUCache<string, true>;
  /** sid -> the stored JSON (null: no such session); a write or destroy forgets it. */
  private readonly recent: KeptReads<string, string | null>;

  constructor(options: LeanSessionStoreOptions) {
    super(options);
    this.db = options.db;
    if (!/^[a-z_]+$/.test(options.tableName)) throw new Error(`session table name ${options.tableName} is not a plain name`);
    this.table = options.tableName;
    this.expirationMs = options.expiration;
    this.touched = new LRUCache<string, true>({ max: MAX_REMEMBERED, ttl: Math.max(1, options.touchEveryMs ?? 60_000) });
    this.recent = new KeptReads<string, string | null>({ max: MAX_REMEMBERED, ttlMs: options.readCacheMs ?? 1000 });
  }

  override get(sid: string, callback: (err: unknown, session?: SessionData | null) => void): void {
    this.recent
      .get(sid, () =>
        this.db
          .query<{ data: string | null }>(`SELECT data FROM ${this.table} WHERE sid = ? AND (expires IS NULL OR expires > ?)`, {
            replacements: [sid, new Date()],
            type: QueryTypes.SELECT,
          })
          .then((rows) => rows[0]?.data ?? null),
      )
      .then(
        // parsed anew for each caller: express-session changes the object it gets
        (data) => callback(null, data ? (JSON.parse(data) as SessionData) : null),
        (err: unknown) => callback(err),
      );
  }

  // The package's typings declare touch as a property, so it is one here too.
  override touch = (sid: string, data: SessionData, callback?: (err: unknown) => void): void => {
    if (this.touched.has(sid)) {
      callback?.(null);
      return;
    }
    const now = Date.now();
    const expires = data.cookie?.expires ? new Date(data.cookie.expires) : new Date(now + this.expirationMs);
    this.db.query(`UPDATE ${this.table} SET expires = ?, updated_at = ? WHERE sid = ?`, { replacements: [expires, new Date(now), sid], type: QueryTypes.UPDATE }).then(
      () => {
        this.touched.set(sid, true);
        callback?.(null);
      },
      (err: unknown) => callback?.(err),
    );
  };

  override set(sid: string, data: SessionData, callback?: (err?: unknown) => void): void {
    // A written session has a fresh expiry, so it counts as touched now.
    this.touched.set(sid, true);
    this.forget(sid);
    // Again once written: a read that began while the write was under way may have seen the old row.
    super.set(sid, data, (err?: unknown) => {
      this.forget(sid);
      callback?.(err);
    });
  }

  override destroy(sid: string, callback?: (err?: unknown) => void): void {
    this.touched.delete(sid);
    this.forget(sid);
    super.destroy(sid, (err?: unknown) => {
      this.forget(sid);
      callback?.(err);
    });
  }

  private forget(sid: string): void {
    this.recent.forget(sid);
  }
}
