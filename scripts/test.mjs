// `npm test`: the start script's set-up for a separate test instance, then
// every package's suites and the browser tests, then one summary line.
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { spawnSync } from 'node:child_process';

import { prepareTestInstance } from './lib/test-instance.mjs';
import { step } from './lib/run.mjs';

const root = path.resolve(import.meta.dirname, '..');
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
  const { env, close } = await prepareTestInstance(root);
  let totals = { passed: 0, failed: 0, skipped: 0 };
  const problems = [];
  try {
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
    await close();
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
