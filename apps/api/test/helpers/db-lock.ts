// Holds the audit chain's head row from a connection of our own, so that a
// write request is caught mid-transaction (its rows inserted, waiting for the
// head lock) at a moment the test chooses. Used by the fault tests.
import mariadb from 'mariadb';

export interface HeldLock {
  /** Waits until `rows` uncommitted candidates of the line exist (a dirty read), i.e. the upload is mid-transaction. */
  waitForUncommitted(lineId: number, rows: number, pending: Promise<unknown>, timeoutMs?: number): Promise<void>;
  release(): Promise<void>;
}

function connect() {
  return mariadb.createConnection({
    host: process.env.DB_HOST ?? '127.0.0.1',
    port: Number(process.env.DB_PORT ?? 3408),
    user: process.env.DB_USER ?? 'polecourt',
    password: process.env.DB_PASSWORD,
    database: process.env.DB_NAME ?? 'polecourt_test',
    connectTimeout: 2000,
  });
}

export async function holdAuditHead(): Promise<HeldLock> {
  const holder = await connect();
  const watcher = await connect();
  // Both connections die with the database in some tests: that is expected, not an error to report.
  holder.on('error', () => undefined);
  watcher.on('error', () => undefined);
  await holder.query('SET SESSION innodb_lock_wait_timeout = 60');
  await holder.beginTransaction();
  await holder.query('SELECT last_id FROM audit_head WHERE id = 1 FOR UPDATE');
  // The watcher reads uncommitted rows: it sees the upload's inserts before any commit.
  await watcher.query('SET SESSION TRANSACTION ISOLATION LEVEL READ UNCOMMITTED');
  const quietly = async (f: () => Promise<unknown>) => {
    try {
      await f();
    } catch {
      /* the connection may already be gone with the database */
    }
  };
  return {
    async waitForUncommitted(lineId, rows, pending, timeoutMs = 45_000) {
      const deadline = Date.now() + timeoutMs;
      let settled: string | null = null;
      void pending.then(
        (v) => (settled = `the request finished first: ${JSON.stringify(v).slice(0, 300)}`),
        (e: Error) => (settled = `the request failed first: ${e.message}`),
      );
      for (;;) {
        if (settled) throw new Error(settled);
        const r = await watcher.query('SELECT COUNT(*) AS n FROM candidates WHERE product_line_id = ?', [lineId]);
        const seen = Number(r[0].n);
        if (seen >= rows) return;
        if (Date.now() > deadline) throw new Error(`only ${seen} of ${rows} uncommitted rows appeared within ${timeoutMs} ms`);
        await new Promise((res) => setTimeout(res, 25));
      }
    },
    async release() {
      await quietly(() => holder.rollback());
      await quietly(() => holder.end());
      await quietly(() => watcher.end());
    },
  };
}
