// `npm run stop`: stops the MariaDB instances that the start and test scripts started.
import path from 'node:path';

import { instance, stopMariadb } from './lib/mariadb.mjs';

const root = path.resolve(import.meta.dirname, '..');
for (const [name, port] of [['dev', Number(process.env.POLECOURT_DB_PORT ?? 3407)], ['test', Number(process.env.POLECOURT_TEST_DB_PORT ?? 3408)]]) {
  const stopped = await stopMariadb(instance(root, name, port));
  console.log(stopped ? `stopped MariaDB (${name})` : `MariaDB (${name}) was not running`);
}
