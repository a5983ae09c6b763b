// Stops and starts the test MariaDB instance that `npm test` runs, for fault tests.
import path from 'node:path';

// @ts-expect-error plain JavaScript module shared with the set-up scripts
import { instance, startMariadb, stopMariadb } from '../../../../scripts/lib/mariadb.mjs';

function testInstance() {
  const root = process.env.POLECOURT_ROOT ?? path.resolve(import.meta.dirname, '../../../..');
  return instance(root, 'test', Number(process.env.POLECOURT_TEST_DB_PORT ?? 3408));
}

export async function stopDatabase(): Promise<void> {
  await stopMariadb(testInstance());
}

export async function startDatabase(): Promise<void> {
  await startMariadb(testInstance());
}
