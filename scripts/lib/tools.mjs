// Installs what a fresh Debian machine lacks: pnpm (via npm), the workspace's
// packages, and Debian packages (MariaDB; for tests Chromium and poppler-utils,
// and wrk, the load generator of `pnpm bench:robustness`).
import { existsSync } from 'node:fs';

import { capture, has, run, step } from './run.mjs';

export const PNPM_VERSION = '12.4.2';

export function ensurePnpm() {
  const v = capture('pnpm', ['--version'])?.trim();
  if (v === PNPM_VERSION) return;
  step(`installing pnpm ${PNPM_VERSION} with npm${v ? ` (found ${v})` : ''}`);
  run('npm', ['install', '--global', `pnpm@${PNPM_VERSION}`, '--no-fund', '--no-audit']);
}

export function ensureWorkspace(root) {
  step('installing the workspace packages (pnpm install --frozen-lockfile)');
  run('pnpm', ['install', '--frozen-lockfile', '--reporter=append-only'], { cwd: root, env: { ...process.env, CI: 'true' } });
}

let aptUpdated = false;
function aptInstall(packages) {
  const sudo = process.getuid?.() === 0 ? [] : ['sudo'];
  if (sudo.length && !has('sudo')) throw new Error(`Please install these Debian packages as root: ${packages.join(' ')}`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!aptUpdated) {
    step('apt-get update');
    run(sudo[0] ?? 'apt-get', [...sudo.slice(1), ...(sudo.length ? ['apt-get'] : []), 'update', '-qq'], { env });
    aptUpdated = true;
  }
  step(`apt-get install ${packages.join(' ')}`);
  run(sudo[0] ?? 'apt-get', [...sudo.slice(1), ...(sudo.length ? ['apt-get'] : []), 'install', '-y', '-qq', '--no-install-recommends', ...packages], { env });
}

/** Debian package names for the commands the app or its tests need. */
export function ensureDebianTools({ forTests }) {
  const missing = [];
  if (!has('mariadbd') && !existsSync('/usr/sbin/mariadbd')) missing.push('mariadb-server');
  if (!has('pdfsig')) missing.push('poppler-utils');
  if (forTests && !existsSync('/usr/bin/chromium')) missing.push('chromium');
  if (forTests && !has('wrk')) missing.push('wrk');
  if (missing.length) aptInstall(missing);
}
