// `pnpm bench:robustness`: every robustness figure from one command. It sets
// up the test instance as `npm test` does (fresh database), runs the access
// matrix, hostile-input and fault tests (apps/api/test/robustness), then the
// load bench (apps/api/bench/load.ts, which takes its own flags: anything
// given here is passed on), and ends with the counts and figures together.
import { spawn } from 'node:child_process';
import path from 'node:path';
import { stripVTControlCharacters } from 'node:util';

import { tsxBin } from './lib/env.mjs';
import { step } from './lib/run.mjs';
import { prepareTestInstance } from './lib/test-instance.mjs';

const root = path.resolve(import.meta.dirname, '..');
const api = path.join(root, 'apps/api');
const loadArgs = process.argv.slice(2).filter((a) => a !== '--');

// The lines the tests and the bench print that belong in the summary.
const FIGURE = /^(access matrix:|hostile |raw hostile |engine CLI:|fault:|load bench:|engine alone|floor:|(GET|POST) \/| {2}CPU over| {2}data disk|targets:)/;

/** Runs a command with its output shown as it comes, and keeps the figure lines. */
function runShown(cmd, args, options) {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { ...options, stdio: ['ignore', 'pipe', 'inherit'] });
    const figures = [];
    let rest = '';
    child.stdout.on('data', (chunk) => {
      process.stdout.write(chunk);
      const lines = (rest + chunk.toString('utf8')).split('\n');
      rest = lines.pop() ?? '';
      for (const line of lines) {
        const plain = stripVTControlCharacters(line);
        if (FIGURE.test(plain)) figures.push(plain);
      }
    });
    child.on('error', reject);
    child.on('close', (code) => resolve({ code, figures }));
  });
}

async function main() {
  const { env, close } = await prepareTestInstance(root);
  let tests;
  let load;
  try {
    step('robustness tests: access matrix, hostile input, faults');
    tests = await runShown('pnpm', ['exec', 'vitest', 'run', 'test/robustness', '--reporter=default'], { cwd: api, env });
    step('load on loopback');
    load = await runShown(tsxBin(root), ['bench/load.ts', ...loadArgs], { cwd: api, env });
  } finally {
    await close();
  }
  console.log('\nrobustness figures');
  for (const line of [...tests.figures, ...load.figures]) console.log(`  ${line}`);
  if (tests.code !== 0) console.log(`  the robustness tests failed (vitest exit code ${tests.code}): see above`);
  if (load.code !== 0) console.log(`  the load bench stopped with exit code ${load.code}: see above`);
  process.exit(tests.code === 0 && load.code === 0 ? 0 : 1);
}

main().catch((err) => {
  console.error(`\nbench:robustness stopped: ${err.message}`);
  process.exit(1);
});
