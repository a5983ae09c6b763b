import { readFileSync, readdirSync } from 'node:fs';

// Who used the machine's CPU during a measured run, read from Linux's /proc:
// the API's process tree (the cluster primary and its workers), this process
// (the load generator, when it is autocannon) and the whole machine. On a
// small machine the load generator and the database share the API's cores,
// so a latency figure is best read beside these shares. Elsewhere than Linux
// every figure is null.

const TICKS_PER_SECOND = 100; // USER_HZ, 100 on every Linux architecture Node runs on

export interface CpuSnapshot {
  at: number;
  /** utime + stime of the tree, in ticks. */
  treeTicks: number;
  selfMicros: number;
  /** Busy and total ticks of all cores (/proc/stat). */
  machineBusy: number;
  machineTotal: number;
}

export interface CpuShare {
  /** Cores used on average over the interval. */
  apiCores: number;
  generatorCores: number;
  machineCores: number;
  /** API CPU milliseconds per completed response. */
  apiMsPerResponse: number;
}

function processTicks(pid: number): number {
  // Fields after the command (which may hold spaces) start at ") ": utime and stime are fields 14 and 15.
  const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
  const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
  return Number(fields[11]) + Number(fields[12]);
}

function children(pid: number): number[] {
  const out: number[] = [];
  for (const task of readdirSync(`/proc/${pid}/task`)) {
    const text = readFileSync(`/proc/${pid}/task/${task}/children`, 'utf8').trim();
    if (text) out.push(...text.split(' ').map(Number));
  }
  return out;
}

function treeTicks(pid: number): number {
  let sum = 0;
  const todo = [pid];
  while (todo.length > 0) {
    const p = todo.pop()!;
    try {
      sum += processTicks(p);
      todo.push(...children(p));
    } catch {
      // the process ended between listing and reading
    }
  }
  return sum;
}

function machineTicks(): { busy: number; total: number } {
  const line = readFileSync('/proc/stat', 'utf8').split('\n')[0]!;
  const v = line.trim().split(/\s+/).slice(1).map(Number);
  const total = v.reduce((a, b) => a + b, 0);
  const idle = (v[3] ?? 0) + (v[4] ?? 0); // idle + iowait
  return { busy: total - idle, total };
}

export function cpuSnapshot(apiPid: number): CpuSnapshot | null {
  try {
    const m = machineTicks();
    const self = process.cpuUsage();
    return { at: performance.now(), treeTicks: treeTicks(apiPid), selfMicros: self.user + self.system, machineBusy: m.busy, machineTotal: m.total };
  } catch {
    return null;
  }
}

export function cpuShare(a: CpuSnapshot | null, b: CpuSnapshot | null, responses: number, cores: number): CpuShare | null {
  if (!a || !b || b.at <= a.at) return null;
  const seconds = (b.at - a.at) / 1000;
  const apiSeconds = (b.treeTicks - a.treeTicks) / TICKS_PER_SECOND;
  const machineTotal = b.machineTotal - a.machineTotal;
  return {
    apiCores: apiSeconds / seconds,
    generatorCores: (b.selfMicros - a.selfMicros) / 1e6 / seconds,
    machineCores: machineTotal > 0 ? ((b.machineBusy - a.machineBusy) / machineTotal) * cores : Number.NaN,
    apiMsPerResponse: responses > 0 ? (apiSeconds * 1000) / responses : Number.NaN,
  };
}
