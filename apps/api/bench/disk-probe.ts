import { spawn } from 'node:child_process';

// How long the database's disk takes to make a small write durable, measured
// beside a run: a child process (so its blocking calls stay off the load
// generator's event loop) writes 4 KB and calls fdatasync every 10 ms in the
// given folder. Every stored assessment waits for one such flush at commit
// (innodb_flush_log_at_trx_commit=1, the durable setting), so the tail of
// these figures is a floor under the assessments' tail on the same disk.

export interface DiskProbe {
  flushes: number;
  p50: number;
  p99: number;
  max: number;
}

const SCRIPT = `
const fs = require('node:fs');
const path = require('node:path');
const [dir, ms] = process.argv.slice(1);
const file = path.join(dir, '.fsync-probe-' + process.pid);
const fd = fs.openSync(file, 'w');
const buf = Buffer.alloc(4096, 1);
const times = [];
const end = Date.now() + Number(ms);
(function step() {
  if (Date.now() >= end) {
    fs.closeSync(fd);
    fs.unlinkSync(file);
    times.sort((a, b) => a - b);
    const q = (p) => times[Math.min(times.length - 1, Math.ceil(p * times.length) - 1)];
    console.log(JSON.stringify({ flushes: times.length, p50: q(0.5), p99: q(0.99), max: times[times.length - 1] }));
    return;
  }
  fs.writeSync(fd, buf, 0, buf.length, 0);
  const t = process.hrtime.bigint();
  fs.fdatasyncSync(fd);
  times.push(Number(process.hrtime.bigint() - t) / 1e6);
  setTimeout(step, 10);
})();
`;

/** Probes for `ms` milliseconds; resolves null if the probe could not run (the folder is not writable). */
export function probeDisk(dir: string, ms: number): Promise<DiskProbe | null> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, ['-e', SCRIPT, dir, String(Math.max(1, Math.round(ms)))], { stdio: ['ignore', 'pipe', 'ignore'] });
    let out = '';
    child.stdout.on('data', (d: Buffer) => (out += d.toString()));
    child.once('error', () => resolve(null));
    child.once('exit', () => {
      try {
        resolve(JSON.parse(out) as DiskProbe);
      } catch {
        resolve(null);
      }
    });
  });
}
