// Small process helpers for the set-up scripts (plain Node: they run before
// any dependency is installed).
import { spawn, spawnSync } from 'node:child_process';

export function has(cmd) {
  return spawnSync('sh', ['-c', `command -v ${cmd}`], { stdio: 'ignore' }).status === 0;
}

/** Runs a command with inherited output; throws with its name if it fails. */
export function run(cmd, args, options = {}) {
  const r = spawnSync(cmd, args, { stdio: 'inherit', ...options });
  if (r.error) throw new Error(`${cmd} could not be run: ${r.error.message}`);
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(' ')} failed with exit code ${r.status}`);
  return r;
}

/** Runs a command quietly and returns its stdout; null if it fails. */
export function capture(cmd, args, options = {}) {
  const r = spawnSync(cmd, args, { encoding: 'utf8', ...options });
  if (r.error || r.status !== 0) return null;
  return r.stdout;
}

export function step(message) {
  console.log(`\x1b[36m▸\x1b[0m ${message}`);
}

export function spawnChild(cmd, args, options = {}) {
  return spawn(cmd, args, { stdio: 'inherit', ...options });
}

export function sleep(ms) {
  return new Promise((r) => setTimeout(r, ms));
}
