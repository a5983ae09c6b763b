// A private MariaDB instance for Polecourt: its own data folder under .data/,
// bound to 127.0.0.1 on its own port, never the system's 3306 or its config.
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { randomBytes } from 'node:crypto';
import { spawn, spawnSync } from 'node:child_process';
import path from 'node:path';

import { run, sleep, step } from './run.mjs';

const MARIADBD = existsSync('/usr/sbin/mariadbd') ? '/usr/sbin/mariadbd' : 'mariadbd';

export function instance(root, name, port) {
  const dir = path.join(root, '.data', name);
  return {
    name,
    port,
    dir,
    datadir: path.join(dir, 'db'),
    socket: path.join(dir, 'mysqld.sock'),
    pidFile: path.join(dir, 'mysqld.pid'),
    logFile: path.join(dir, 'mysqld.log'),
    secretsFile: path.join(dir, 'secrets.json'),
  };
}

function ping(inst) {
  return spawnSync('mariadb-admin', ['--no-defaults', `--socket=${inst.socket}`, '-uroot', '--connect-timeout=2', 'ping'], { stdio: 'ignore' }).status === 0;
}

export function isRunning(inst) {
  return existsSync(inst.socket) && ping(inst);
}

/** Secrets made once per instance and kept in its folder (git-ignored). */
export function secrets(inst) {
  mkdirSync(inst.dir, { recursive: true });
  if (existsSync(inst.secretsFile)) return JSON.parse(readFileSync(inst.secretsFile, 'utf8'));
  const s = { dbPassword: randomBytes(18).toString('base64url'), sessionSecret: randomBytes(32).toString('base64url') };
  writeFileSync(inst.secretsFile, JSON.stringify(s, null, 2), { mode: 0o600 });
  return s;
}

/** Initialises (first time) and starts the instance; returns true if this call started it. */
export async function startMariadb(inst) {
  mkdirSync(inst.dir, { recursive: true });
  if (isRunning(inst)) return false;
  const asRoot = process.getuid?.() === 0;
  if (!existsSync(path.join(inst.datadir, 'mysql'))) {
    step(`initialising the ${inst.name} database folder in ${path.relative(process.cwd(), inst.datadir) || inst.datadir}`);
    rmSync(inst.datadir, { recursive: true, force: true });
    run('mariadb-install-db', [
      '--no-defaults',
      `--datadir=${inst.datadir}`,
      ...(asRoot ? ['--user=root'] : []),
      '--auth-root-authentication-method=normal',
      '--skip-test-db',
    ], { stdio: ['ignore', 'ignore', 'inherit'] });
  }
  step(`starting MariaDB (${inst.name}) on 127.0.0.1:${inst.port}`);
  rmSync(inst.socket, { force: true });
  const child = spawn(
    MARIADBD,
    [
      '--no-defaults',
      `--datadir=${inst.datadir}`,
      `--socket=${inst.socket}`,
      `--port=${inst.port}`,
      '--bind-address=127.0.0.1',
      ...(asRoot ? ['--user=root'] : []),
      `--pid-file=${inst.pidFile}`,
      `--log-error=${inst.logFile}`,
      '--skip-name-resolve',
      '--character-set-server=utf8mb4',
      '--collation-server=utf8mb4_unicode_ci',
      // Room for the working set, and a redo log that a burst of assessment and
      // audit writes (about 10 KB each with their JSON) does not wrap within
      // seconds: a small log makes InnoDB stall writes to flush pages early.
      '--innodb-buffer-pool-size=512M',
      '--innodb-log-file-size=512M',
      '--max-connections=300',
      '--default-time-zone=+00:00',
    ],
    { detached: true, stdio: 'ignore' },
  );
  child.unref();
  for (let i = 0; i < 150; i++) {
    if (ping(inst)) return true;
    if (child.exitCode !== null) break;
    await sleep(200);
  }
  const log = existsSync(inst.logFile) ? readFileSync(inst.logFile, 'utf8').split('\n').slice(-15).join('\n') : '(no log)';
  throw new Error(`MariaDB (${inst.name}) did not start on port ${inst.port}. Is the port taken? Last lines of ${inst.logFile}:\n${log}`);
}

export async function stopMariadb(inst) {
  if (!isRunning(inst)) return false;
  spawnSync('mariadb-admin', ['--no-defaults', `--socket=${inst.socket}`, '-uroot', 'shutdown'], { stdio: 'ignore' });
  for (let i = 0; i < 100 && existsSync(inst.pidFile); i++) await sleep(100);
  return true;
}

function sql(inst, statements) {
  const r = spawnSync('mariadb', ['--no-defaults', `--socket=${inst.socket}`, '-uroot', '--batch'], { input: statements, encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`MariaDB (${inst.name}) refused the set-up SQL: ${r.stderr}`);
  return r.stdout;
}

/** Creates the database and the application's password user (idempotent); `fresh` drops it first. */
export function ensureDatabase(inst, { database, user, password, fresh = false }) {
  const lines = [];
  if (fresh) lines.push(`DROP DATABASE IF EXISTS \`${database}\`;`);
  lines.push(`CREATE DATABASE IF NOT EXISTS \`${database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`);
  for (const host of ['127.0.0.1', 'localhost']) {
    lines.push(`CREATE USER IF NOT EXISTS '${user}'@'${host}' IDENTIFIED BY '${password}';`);
    lines.push(`ALTER USER '${user}'@'${host}' IDENTIFIED BY '${password}';`);
    lines.push(`GRANT ALL PRIVILEGES ON \`${database}\`.* TO '${user}'@'${host}';`);
  }
  lines.push('FLUSH PRIVILEGES;');
  sql(inst, lines.join('\n'));
}
