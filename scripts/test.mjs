// `npm test`: the start script's set-up for a separate test instance, then
// every package's suites and the browser tests, then one summary line.
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { spawnSync } from 'node:child_process';

import { buildAll } from './lib/build.mjs';
import { apiEnv, tsxBin } from './lib/env.mjs';
import { ensureDatabase, instance, secrets, startMariadb, stopMariadb } from './lib/mariadb.mjs';
import { run, step } from './lib/run.mjs';
import { ensureDebianTools, ensurePnpm, ensureWorkspace } from './lib/tools.mjs';

const root = path.resolve(import.meta.dirname, '..');
const dbPort = Number(process.env.POLECOURT_TEST_DB_PORT ?? 3408);
const resultsDir = path.join(root, '.test-results');

// Suites in the order they run; `needsDb` ones get the test database.
const suites = [
  { name: 'engine', filter: '@polecourt/spec' },
  { name: 'contracts', filter: '@polecourt/contracts' },
  { name: 'plots', filter: '@polecourt/plots' },
  { name: 'web', filter: '@polecourt/web' },
  { name: 'api', filter: '@polecourt/api', needsDb: true },
  { name: 'browser', filter: '@polecourt/tests', needsDb: true },
];

async function main() {
  const only = process.argv.slice(2);
  ensurePnpm();
  ensureWorkspace(root);
  ensureDebianTools({ forTests: true });

  const inst = instance(root, 'test', dbPort);
  const secret = secrets(inst);
  const startedDb = await startMariadb(inst);
  let totals = { passed: 0, failed: 0, skipped: 0 };
  const problems = [];
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

    rmSync(resultsDir, { recursive: true, force: true });
    mkdirSync(resultsDir, { recursive: true });
    for (const suite of suites) {
      if (only.length && !only.includes(suite.name)) continue;
      step(`test suite: ${suite.name}`);
      const out = path.join(resultsDir, `${suite.name}.json`);
      const r = spawnSync('pnpm', ['--filter', suite.filter, 'exec', 'vitest', 'run', '--passWithNoTests', '--reporter=default', '--reporter=json', `--outputFile=${out}`], {
        cwd: root,
        stdio: 'inherit',
        env: suite.needsDb ? env : { ...process.env, NODE_ENV: 'test' },
      });
      if (!existsSync(out)) {
        problems.push(`${suite.name}: the suite did not report (exit code ${r.status})`);
        totals.failed += 1;
        continue;
      }
      const report = JSON.parse(readFileSync(out, 'utf8'));
      totals.passed += report.numPassedTests ?? 0;
      totals.failed += report.numFailedTests ?? 0;
      totals.skipped += (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
      // A file that fails to load counts as a failure even with no failed test.
      const brokenFiles = (report.testResults ?? []).filter((f) => f.status === 'failed' && (f.assertionResults ?? []).every((a) => a.status !== 'failed'));
      if (brokenFiles.length) {
        totals.failed += brokenFiles.length;
        problems.push(...brokenFiles.map((f) => `${suite.name}: ${path.relative(root, f.name)} failed to run: ${(f.message ?? '').split('\n')[0]}`));
      }
      if (r.status !== 0 && (report.numFailedTests ?? 0) === 0 && !brokenFiles.length) {
        totals.failed += 1;
        problems.push(`${suite.name}: vitest exited with code ${r.status}`);
      }
    }
  } finally {
    if (startedDb && !process.env.POLECOURT_KEEP_TEST_DB) await stopMariadb(inst);
  }
  for (const p of problems) console.log(`problem: ${p}`);
  console.log(`\n${totals.passed} passed, ${totals.failed} failed${totals.skipped ? `, ${totals.skipped} skipped` : ''}`);
  process.exit(totals.failed === 0 && totals.passed > 0 ? 0 : 1);
}

main().catch((err) => {
  console.error(`\nnpm test stopped: ${err.message}`);
  console.log('0 passed, 1 failed');
  process.exit(1);
});
