// `npm start`: install what is missing, start MariaDB on loopback, migrate,
// seed the demo once, build, and serve API and client on one port.
import net from 'node:net';
import path from 'node:path';

import { buildAll } from './lib/build.mjs';
import { apiEnv, tsxBin } from './lib/env.mjs';
import { ensureDatabase, instance, secrets, startMariadb } from './lib/mariadb.mjs';
import { run, sleep, spawnChild, step } from './lib/run.mjs';
import { ensureDebianTools, ensurePnpm, ensureWorkspace } from './lib/tools.mjs';

const root = path.resolve(import.meta.dirname, '..');
const dbPort = Number(process.env.POLECOURT_DB_PORT ?? 3407);
const port = Number(process.env.PORT ?? 5180);

async function main() {
  ensurePnpm();
  ensureWorkspace(root);
  ensureDebianTools({ forTests: false });

  const inst = instance(root, 'dev', dbPort);
  const secret = secrets(inst);
  await startMariadb(inst);
  ensureDatabase(inst, { database: 'polecourt', user: 'polecourt', password: secret.dbPassword });

  // The local fakes for mail and the report archive start with the app unless the
  // environment points Polecourt at real services.
  const env = apiEnv(root, inst, secret, {
    NODE_ENV: 'production',
    PORT: String(port),
    HOST: process.env.HOST ?? '127.0.0.1',
    MAIL_FAKE: process.env.MAIL_FAKE ?? 'true',
    S3_FAKE: process.env.S3_FAKE ?? 'true',
  });
  const api = path.join(root, 'apps/api');
  step('migrating the database');
  run(tsxBin(root), ['src/db/migrate-cli.ts', 'up'], { cwd: api, env });
  step('seeding the demo company (first run only)');
  run(tsxBin(root), ['src/db/migrate-cli.ts', 'seed'], { cwd: api, env });

  buildAll(root);

  if (!(await portFree(port, env.HOST))) {
    throw new Error(`port ${port} is already in use (is Polecourt already running?). Stop it, or set PORT to a free port.`);
  }
  step(`starting Polecourt on http://${env.HOST}:${port}`);
  const server = spawnChild(tsxBin(root), ['src/main.ts'], { cwd: api, env });
  const forward = (sig) => server.kill(sig);
  process.on('SIGINT', forward);
  process.on('SIGTERM', forward);
  let exited = false;
  server.on('exit', (code) => {
    exited = true;
    process.exit(code ?? 0);
  });

  for (let i = 0; i < 100 && !exited; i++) {
    try {
      const r = await fetch(`http://127.0.0.1:${port}/api/health`);
      if (r.ok) break;
    } catch {
      /* not up yet */
    }
    await sleep(200);
  }
  if (exited) return;
  console.log(`
  Polecourt is running: http://${env.HOST}:${port}

  Demo accounts (password: polecourt-demo)
    admin@example.com      administrator
    systems@example.com    systems engineer
    controls@example.com   controls engineer
    auditor@example.com    quality auditor

  Ctrl-C stops the server; \`npm run stop\` also stops the database.
`);
}

function portFree(p, host) {
  return new Promise((resolve) => {
    const probe = net.createServer();
    probe.once('error', () => resolve(false));
    probe.listen(p, host, () => probe.close(() => resolve(true)));
  });
}

main().catch((err) => {
  console.error(`\nnpm start stopped: ${err.message}`);
  process.exit(1);
});
