// Builds only what changed: the engine (tsc, and one bundled file for the CLI) and the web client (vite).
import { existsSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';

import { run, step } from './run.mjs';

function newest(p) {
  if (!existsSync(p)) return 0;
  const s = statSync(p);
  if (!s.isDirectory()) return s.mtimeMs;
  let m = s.mtimeMs;
  for (const entry of readdirSync(p)) {
    if (entry === 'node_modules' || entry === 'dist') continue;
    m = Math.max(m, newest(path.join(p, entry)));
  }
  return m;
}

function stale(output, inputs) {
  if (!existsSync(output)) return true;
  const built = statSync(output).mtimeMs;
  return inputs.some((i) => newest(i) > built);
}

export function buildAll(root, { force = false } = {}) {
  const spec = path.join(root, 'packages/spec');
  const contracts = path.join(root, 'packages/contracts');
  const web = path.join(root, 'apps/web');
  const lock = path.join(root, 'pnpm-lock.yaml');
  if (force || stale(path.join(spec, 'dist/cli.js'), [path.join(spec, 'src'), path.join(spec, 'scripts'), path.join(spec, 'package.json'), lock])) {
    step('building the engine and its CLI (packages/spec)');
    run('pnpm', ['--filter', '@polecourt/spec', 'run', 'build'], { cwd: root });
  }
  const webInputs = [path.join(web, 'src'), path.join(web, 'index.html'), path.join(web, 'vite.config.ts'), path.join(web, 'package.json'), path.join(spec, 'src'), path.join(contracts, 'src'), lock];
  if (force || stale(path.join(web, 'dist/index.html'), webInputs)) {
    step('building the web client (apps/web)');
    run('pnpm', ['--filter', '@polecourt/web', 'run', 'build'], { cwd: root });
  }
}
