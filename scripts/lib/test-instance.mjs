// The test instance that `npm test` and `pnpm bench:robustness` share: tools
// and packages installed if missing, the test MariaDB (127.0.0.1:3408,
// .data/test) started, a fresh database migrated and seeded, the packages built.
import path from 'node:path';

import { buildAll } from './build.mjs';
import { apiEnv, tsxBin } from './env.mjs';
import { ensureDatabase, instance, secrets, startMariadb, stopMariadb } from './mariadb.mjs';
import { run, step } from './run.mjs';
import { ensureDebianTools, ensurePnpm, ensureWorkspace } from './tools.mjs';

/**
 * Sets the test instance up and returns the environment for processes that
 * use it, and `close()`, which stops the database if this call started it
 * (and POLECOURT_KEEP_TEST_DB is not set).
 */
export async function prepareTestInstance(root) {
  const dbPort = Number(process.env.POLECOURT_TEST_DB_PORT ?? 3408);
  ensurePnpm();
  ensureWorkspace(root);
  ensureDebianTools({ forTests: true });

  const inst = instance(root, 'test', dbPort);
  const secret = secrets(inst);
  const startedDb = await startMariadb(inst);
  const close = async () => {
    if (startedDb && !process.env.POLECOURT_KEEP_TEST_DB) await stopMariadb(inst);
  };
  try {
    ensureDatabase(inst, { database: 'polecourt_test', user: 'polecourt', password: secret.dbPassword, fresh: true });
    const env = apiEnv(root, inst, secret, {
      NODE_ENV: 'test',
      DB_NAME: 'polecourt_test',
      LOG_LEVEL: 'silent',
      POLECOURT_TEST_DB_DIR: inst.dir,
      POLECOURT_TEST_DB_PORT: String(inst.port),
    });
    const api = path.join(root, 'apps/api');
    step('migrating and seeding the test database');
    run(tsxBin(root), ['src/db/migrate-cli.ts', 'up'], { cwd: api, env });
    run(tsxBin(root), ['src/db/migrate-cli.ts', 'seed'], { cwd: api, env });
    if (!process.env.POLECOURT_SKIP_BUILD) buildAll(root);
    return { env, close };
  } catch (e) {
    await close();
    throw e;
  }
}
