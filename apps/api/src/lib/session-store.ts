import ConnectSessionSequelize from 'connect-session-sequelize';
import session, { type SessionData } from 'express-session';
import LRUCache from 'lru-cache';
import { QueryTypes, type Sequelize } from 'sequelize';

/**
 * connect-session-sequelize with its two per-request calls made lean: every
 * request reads its session (get) and, with a rolling cookie, extends it
 * (touch). The package does both through model instances (about 0.8 ms of
 * CPU each on a small machine); here they are one plain query, and a touch
 * is written at most once per `touchEveryMs` per session and process, since
 * moving an expiry of hours by a few seconds is not worth a write. Writing a
 * new or changed session (set) and destroying one stay the package's.
 *
 * A read is kept for `readCacheMs` (1 s by default): a busy client's burst of
 * requests reads its session once, and concurrent reads of one session share
 * one query. Writing or destroying a session in this
 * process drops the kept copy at once; another API process sees a sign-out
 * within that second.
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
  /** sid -> the stored JSON; parsed anew on each get, since express-session mutates what it gets. */
  private readonly recent: LRUCache<string, string>;
  /** sid -> sequence number of its last write or destroy: a read that began before it is not kept. */
  private readonly lastWrite = new LRUCache<string, number>({ max: MAX_REMEMBERED });
  /** sid -> the read under way; a write or destroy drops it, so a later get reads anew. */
  private readonly reading = new Map<string, Promise<string | null>>();
  private seq = 0;

  constructor(options: LeanSessionStoreOptions) {
    super(options);
    this.db = options.db;
    if (!/^[a-z_]+$/.test(options.tableName)) throw new Error(`session table name ${options.tableName} is not a plain name`);
    this.table = options.tableName;
    this.expirationMs = options.expiration;
    this.touched = new LRUCache<string, true>({ max: MAX_REMEMBERED, ttl: Math.max(1, options.touchEveryMs ?? 60_000) });
    this.recent = new LRUCache<string, string>({ max: MAX_REMEMBERED, ttl: Math.max(1, options.readCacheMs ?? 1000) });
  }

  override get(sid: string, callback: (err: unknown, session?: SessionData | null) => void): void {
    const kept = this.recent.get(sid);
    if (kept !== undefined) {
      callback(null, JSON.parse(kept) as SessionData);
      return;
    }
    // One read per session at a time: when the kept copy runs out under load,
    // the requests in flight for that session wait on one query, not one each.
    let read = this.reading.get(sid);
    if (!read) {
      const began = ++this.seq;
      read = this.db
        .query<{ data: string | null }>(`SELECT data FROM ${this.table} WHERE sid = ? AND (expires IS NULL OR expires > ?)`, {
          replacements: [sid, new Date()],
          type: QueryTypes.SELECT,
        })
        .then((rows) => {
          const data = rows[0]?.data ?? null;
          if (data && (this.lastWrite.get(sid) ?? 0) < began) this.recent.set(sid, data);
          return data;
        })
        .finally(() => {
          if (this.reading.get(sid) === read) this.reading.delete(sid);
        });
      this.reading.set(sid, read);
    }
    read.then(
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
    this.recent.delete(sid);
    this.reading.delete(sid);
    this.lastWrite.set(sid, ++this.seq);
  }
}
