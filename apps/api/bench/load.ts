// Load figures for two hot routes, over loopback, bounded in time: prints
// requests/s, p50, p99 and errors, and the machine's load average; asserts
// nothing. The API runs as a child process (node --import tsx src/main.ts) so
// the load generator does not share its event loop.
//
//   pnpm --filter @polecourt/api bench:load [--seconds 20] [--connections 100] [--auth session|token]
//     [--routes region,assessments] [--warmup 3] [--profile DIR] [--tool autocannon|wrk] [--processes N]
//     [--node-args="NODE OPTIONS"]
//
// How a route is measured (autocannon, the default): one run of warm-up plus
// measured seconds on the same connections; the figures count the responses
// that complete after the warm-up. The whole run's p99 and max are printed
// beside them, since they include the opening of all the connections at once:
// a busy Node process accepts one new connection per turn of its event loop
// (libuv/libuv#3696), so when 100 connections arrive together the last
// ones wait for about a hundred turns, which shows in the first second of a
// run and in nothing after it. wrk (--tool wrk, Debian's package) cannot
// leave the warm-up out of its figures: with it the warm-up is a run of its
// own and the measured run opens its connections anew, so its figures are
// whole-run figures.
//
// --processes sets API_PROCESSES (default: one per core, the way to run on a
// machine of its own; see the README's "Scale beyond one machine").
//
// The route "floor" (on by default) puts the same load on a bare node:http
// server in its own process that answers every request with a fixed JSON
// body: no Express, no session, no database. Its latency is what this
// machine, its network stack and the load generator allow at best, so the
// API's figures can be read against it.
//
// Without DB_* in the environment it uses the test instance that `npm test`
// prepares (.data/test, 127.0.0.1:3408, database polecourt_test): run it with
// that instance up (POLECOURT_KEEP_TEST_DB=1 npm test -- api, or any run in progress),
// or run it through `pnpm bench:robustness`, which sets the instance up first.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { setTimeout as delay } from 'node:timers/promises';
import { parseArgs } from 'node:util';

import autocannon from 'autocannon';

import { evaluate, regionBounds, regionPolygons } from '@polecourt/spec';

import { cpuShare, cpuSnapshot, type CpuShare, type CpuSnapshot } from './cpu-share.js';
import { probeDisk } from './disk-probe.js';

const { values: args } = parseArgs({
  // `pnpm bench:robustness -- --seconds 5` hands the `--` on: skip it.
  args: process.argv.slice(2).filter((a) => a !== '--'),
  options: {
    seconds: { type: 'string', default: '20' },
    connections: { type: 'string', default: '100' },
    auth: { type: 'string', default: 'session' },
    // Writes a V8 CPU profile of the API process into this folder (open it in a browser's devtools).
    profile: { type: 'string' },
    // Which routes to load: floor, region, assessments (comma-separated).
    routes: { type: 'string', default: 'floor,region,assessments' },
    // Seconds of load before each measured run, not counted: a server that has run a while has its code compiled.
    warmup: { type: 'string', default: '3' },
    // The load generator: autocannon (warm-up left out of the figures) or wrk (apt-get install wrk; whole-run figures).
    tool: { type: 'string', default: 'autocannon' },
    // API processes (API_PROCESSES); default one per core.
    processes: { type: 'string' },
    // Extra Node or V8 options for the API processes (space-separated), to try one: --node-args="--max-semi-space-size=64" (with the =, since the value starts with a dash).
    'node-args': { type: 'string', default: '' },
  },
});
const SECONDS = Number(args.seconds);
const CONNECTIONS = Number(args.connections);
const AUTH = args.auth === 'token' ? 'token' : 'session';
const ROUTES = new Set(args.routes.split(','));
const WARMUP = Number(args.warmup);
const PROCESSES = Number(args.processes ?? os.availableParallelism());
if (args.tool !== 'autocannon' && args.tool !== 'wrk') throw new Error(`--tool ${args.tool}: the tools are autocannon and wrk`);
const TOOL = args.tool;
if (TOOL === 'wrk' && spawnSync('wrk', ['--version']).error !== undefined) throw new Error('--tool wrk: wrk is not installed (apt-get install wrk)');
const API_DIR = path.resolve(import.meta.dirname, '..');
const ROOT = path.resolve(API_DIR, '../..');

function apiEnv(): NodeJS.ProcessEnv {
  if (process.env.DB_PASSWORD) return process.env;
  const secretsFile = path.join(ROOT, '.data/test/secrets.json');
  if (!existsSync(secretsFile)) throw new Error('No DB_* settings and no .data/test/secrets.json: run `npm test` once (POLECOURT_KEEP_TEST_DB=1 keeps its database up).');
  const s = JSON.parse(readFileSync(secretsFile, 'utf8')) as { dbPassword: string; sessionSecret: string };
  return { ...process.env, DB_PORT: '3408', DB_NAME: 'polecourt_test', DB_PASSWORD: s.dbPassword, SESSION_SECRET: s.sessionSecret, POLECOURT_ROOT: ROOT, POLECOURT_DATA_DIR: path.join(ROOT, '.data/test') };
}

/** The folder of the database's files (the test instance's unless DB_* and POLECOURT_DATA_DIR say otherwise). */
function dataDir(): string {
  return apiEnv().POLECOURT_DATA_DIR ?? path.join(ROOT, '.data/test');
}

// Starts a server in a child process; resolves once it prints "serving on URL".
function startServer(what: string, nodeArgs: string[], options: { cwd?: string; env?: NodeJS.ProcessEnv } = {}): Promise<{ child: ChildProcess; url: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, nodeArgs, { ...options, stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    let serving = false;
    // Output is kept (for the error below) only until the server serves: this
    // process is the load generator, and a server that writes much
    // (--node-args=--trace-gc) must not cost it a growing string and its scans.
    const onData = (d: Buffer) => {
      if (serving) return;
      out += d.toString();
      const m = /serving on (http:\/\/\S+)/.exec(out);
      if (m) {
        serving = true;
        out = '';
        resolve({ child, url: m[1]! });
      }
    };
    child.stdout!.on('data', onData);
    child.stderr!.on('data', (d: Buffer) => {
      if (!serving) out += d.toString();
    });
    child.once('exit', (code) => reject(new Error(`${what} exited (${code}) before serving:\n${out}`)));
  });
}

function startApi(): Promise<{ child: ChildProcess; url: string }> {
  const prof = args.profile ? ['--cpu-prof', '--cpu-prof-dir', path.resolve(args.profile)] : [];
  const extra = args['node-args'].split(' ').filter((a) => a !== '');
  return startServer('the API', [...prof, ...extra, '--import', 'tsx', 'src/main.ts'], {
    cwd: API_DIR,
    // Sign-in limits lifted: other runs on the same database may have left failed sign-ins of the demo accounts.
    env: { ...apiEnv(), API_PROCESSES: String(PROCESSES), PORT: '0', SMTP_PORT: '0', S3_PORT: '0', LOG_LEVEL: 'info', NODE_ENV: 'development', MAIL_POLL_MS: '600000', LOGIN_MAX_FAILURES: '10000', LOGIN_MAX_FAILURES_PER_ADDRESS: '100000' },
  });
}

// The bare server of the "floor" run (see the top of this file).
function startFloor(): Promise<{ child: ChildProcess; url: string }> {
  const server = [
    "const body = JSON.stringify({ floor: true, points: Array.from({ length: 50 }, (_, i) => ({ re: -i * 1.2345, im: i * 0.5 })) });",
    "const s = require('node:http').createServer((req, res) => { res.setHeader('content-type', 'application/json'); res.end(body); });",
    "s.listen(0, '127.0.0.1', () => console.log('serving on http://127.0.0.1:' + s.address().port));",
  ].join('\n');
  return startServer('the floor server', ['-e', server]);
}

interface Session {
  cookie: string;
  csrf: string;
}

async function call(base: string, s: Session | null, method: string, p: string, body?: unknown): Promise<{ status: number; body: any; cookie?: string }> {
  const headers: Record<string, string> = { accept: 'application/json' };
  if (s?.cookie) headers.cookie = s.cookie;
  if (s?.csrf && method !== 'GET') headers['x-csrf-token'] = s.csrf;
  if (body !== undefined) headers['content-type'] = 'application/json';
  const res = await fetch(base + p, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
  const set = res.headers.getSetCookie()[0];
  return { status: res.status, body: await res.json().catch(() => null), ...(set ? { cookie: set.split(';')[0]! } : {}) };
}

async function signIn(base: string, email: string): Promise<Session> {
  const r = await call(base, null, 'POST', '/api/auth/login', { email, password: 'polecourt-demo' });
  if (r.status !== 200 || !r.cookie) throw new Error(`sign-in as ${email} failed: ${r.status} ${JSON.stringify(r.body)}`);
  return { cookie: r.cookie, csrf: r.body.csrfToken };
}

async function must(r: Promise<{ status: number; body: any }>, want: number, what: string): Promise<any> {
  const got = await r;
  if (got.status !== want) throw new Error(`${what}: ${got.status} ${JSON.stringify(got.body).slice(0, 300)}`);
  return got.body;
}

const DESIGN = { poles: [{ re: -3, im: 4 }, { re: -3, im: -4 }, { re: -40, im: 0 }], zeros: [], gain: 1000 };
const LIMITS = { maxOvershootPct: 10, maxSettlingTime: 2 };

/** How long the engine work behind each route takes on its own, on this process's thread. */
function engineCost(): { evaluateMs: number; regionMs: number } {
  const time = (f: () => void, n: number) => {
    for (let i = 0; i < 50; i++) f();
    const t = process.hrtime.bigint();
    for (let i = 0; i < n; i++) f();
    return Number(process.hrtime.bigint() - t) / 1e6 / n;
  };
  return {
    evaluateMs: time(() => evaluate(DESIGN, LIMITS), 2000),
    regionMs: time(() => regionPolygons(regionBounds(LIMITS as never), { reMin: -20, reMax: 2, imMin: -12, imMax: 12 }), 2000),
  };
}

/** One load run's figures, whichever tool made them. */
interface LoadResult {
  requestsPerSecond: number;
  total: number;
  p50: number;
  p90: number;
  p99: number;
  max: number;
  non2xx: number;
  socketErrors: number;
  timeouts: number;
  /** Set when the figures leave the warm-up out: the whole run's tail, connection opening included. */
  whole?: { p99: number; max: number };
  /** CPU used over the measured seconds (Linux only). */
  cpu?: CpuShare | null;
}

interface LoadOptions {
  url: string;
  method?: 'GET' | 'POST';
  headers: Record<string, string>;
  body?: string;
  connections: number;
  /** Measured seconds. */
  duration: number;
  /** Seconds of the same load before them, on the same connections (autocannon) or in a run of their own (wrk). */
  warmup: number;
  /** The API's process, whose tree's CPU is counted over the measured seconds. */
  apiPid?: number;
}

const round1 = (ms: number) => Math.round(ms * 10) / 10;

/** The q-quantile of sorted values (nearest rank). */
function quantile(sorted: number[], q: number): number {
  return sorted.length === 0 ? Number.NaN : sorted[Math.min(sorted.length - 1, Math.ceil(q * sorted.length) - 1)]!;
}

/** One autocannon run of warm-up + measured seconds; the figures count the responses completed after the warm-up. */
function runAutocannon(opts: LoadOptions): Promise<LoadResult> {
  return new Promise((resolve, reject) => {
    const start = performance.now();
    const measureFrom = start + opts.warmup * 1000;
    const latencies: number[] = [];
    let non2xx = 0;
    let socketErrors = 0;
    const { warmup: _warmup, apiPid, ...cannon } = opts;
    let cpuFrom: CpuSnapshot | null = null;
    const cpuTimer = setTimeout(() => (cpuFrom = apiPid === undefined ? null : cpuSnapshot(apiPid)), opts.warmup * 1000);
    const instance = autocannon({ ...cannon, duration: opts.warmup + opts.duration }, (err, r) => {
      clearTimeout(cpuTimer);
      const cpu = apiPid === undefined ? null : cpuShare(cpuFrom, cpuSnapshot(apiPid), latencies.length, os.availableParallelism());
      if (err) return reject(err);
      latencies.sort((x, y) => x - y);
      resolve({
        requestsPerSecond: latencies.length / opts.duration,
        total: latencies.length,
        p50: round1(quantile(latencies, 0.5)),
        p90: round1(quantile(latencies, 0.9)),
        p99: round1(quantile(latencies, 0.99)),
        max: round1(latencies[latencies.length - 1] ?? Number.NaN),
        non2xx,
        socketErrors,
        timeouts: r.timeouts,
        whole: { p99: r.latency.p99, max: r.latency.max },
        cpu,
      });
    });
    // Errors count over the whole run, warm-up included: a refused request is one too many at any time.
    instance.on('response', (_client: unknown, status: number, _bytes: number, responseTime: number) => {
      if (status < 200 || status > 299) non2xx++;
      if (performance.now() >= measureFrom) latencies.push(responseTime);
    });
    instance.on('reqError', () => socketErrors++);
  });
}

// A Lua string in long brackets, which need no escaping inside.
const lua = (s: string) => `[==[${s}]==]`;

/** wrk with one thread; a Lua script sets method, headers and body and prints the figures as JSON at the end. */
function runWrk(opts: LoadOptions): Promise<LoadResult> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'polecourt-wrk-'));
  const script = path.join(dir, 'load.lua');
  writeFileSync(
    script,
    [
      `wrk.method = ${lua(opts.method ?? 'GET')}`,
      ...(opts.body === undefined ? [] : [`wrk.body = ${lua(opts.body)}`]),
      ...Object.entries(opts.headers).map(([k, v]) => `wrk.headers[ ${lua(k)} ] = ${lua(v)}`),
      'done = function(s, latency, requests)',
      '  local e = s.errors',
      '  io.write(string.format(\'\\nFIGURES {"requests":%d,"seconds":%f,"p50":%f,"p90":%f,"p99":%f,"max":%f,"status":%d,"connect":%d,"read":%d,"write":%d,"timeout":%d}\\n\',',
      '    s.requests, s.duration / 1e6, latency:percentile(50) / 1e3, latency:percentile(90) / 1e3, latency:percentile(99) / 1e3, latency.max / 1e3,',
      '    e.status, e.connect, e.read, e.write, e.timeout))',
      'end',
    ].join('\n'),
  );
  const cpuFrom = opts.apiPid === undefined ? null : cpuSnapshot(opts.apiPid);
  return new Promise((resolve, reject) => {
    const child = spawn('wrk', ['-t1', `-c${opts.connections}`, `-d${opts.duration}s`, '--timeout', '10s', '-s', script, opts.url], { stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    child.stdout.on('data', (d: Buffer) => (out += d.toString()));
    child.stderr.on('data', (d: Buffer) => (out += d.toString()));
    child.once('error', reject);
    child.once('exit', () => {
      rmSync(dir, { recursive: true, force: true });
      const m = /FIGURES (\{.*\})/.exec(out);
      if (!m) return reject(new Error(`wrk printed no figures:\n${out}`));
      const f = JSON.parse(m[1]!) as Record<string, number>;
      // wrk is a process of its own, not counted as this one's CPU.
      const share = opts.apiPid === undefined ? null : cpuShare(cpuFrom, cpuSnapshot(opts.apiPid), f.requests!, os.availableParallelism());
      resolve({
        requestsPerSecond: f.requests! / f.seconds!,
        total: f.requests!,
        p50: round1(f.p50!),
        p90: round1(f.p90!),
        p99: round1(f.p99!),
        max: round1(f.max!),
        non2xx: f.status!,
        socketErrors: f.connect! + f.read! + f.write!,
        timeouts: f.timeout!,
        cpu: share && { ...share, generatorCores: Number.NaN },
      });
    });
  });
}

async function run(opts: LoadOptions): Promise<LoadResult> {
  if (TOOL === 'autocannon') return runAutocannon(opts);
  if (opts.warmup > 0) await runWrk({ ...opts, duration: opts.warmup });
  return runWrk(opts);
}

function report(name: string, r: LoadResult): void {
  const errors = r.socketErrors + r.timeouts + r.non2xx;
  console.log(
    `${name}: ${r.requestsPerSecond.toFixed(0)} requests/s (total ${r.total}), latency p50 ${r.p50} ms, p90 ${r.p90} ms, p99 ${r.p99} ms, max ${r.max} ms; ` +
      `errors ${errors} (non-2xx ${r.non2xx}, socket errors ${r.socketErrors}, timeouts ${r.timeouts})` +
      (r.whole ? `; whole run with the warm-up and the opening of the connections: p99 ${r.whole.p99} ms, max ${r.whole.max} ms` : ''),
  );
  if (r.cpu) {
    const c = r.cpu;
    const generator = Number.isNaN(c.generatorCores) ? '' : `, load generator ${c.generatorCores.toFixed(2)}`;
    console.log(`  CPU over the measured seconds, in cores: server ${c.apiCores.toFixed(2)} (${c.apiMsPerResponse.toFixed(3)} ms per response)${generator}, whole machine ${c.machineCores.toFixed(2)} of ${os.availableParallelism()}`);
  }
}

const load = () => os.loadavg().map((v) => v.toFixed(2)).join(' ');

async function main(): Promise<void> {
  console.log(`load bench: ${TOOL}, ${CONNECTIONS} connections, ${PROCESSES} API process${PROCESSES === 1 ? '' : 'es'}, ${SECONDS} s per route, auth by ${AUTH}, ${os.cpus().length} cores, load average before: ${load()}`);
  const cost = engineCost();
  console.log(`engine alone on one thread: evaluate ${cost.evaluateMs.toFixed(3)} ms per call, region polygons ${cost.regionMs.toFixed(3)} ms per call`);
  const { child, url } = await startApi();
  try {
    const systems = await signIn(url, 'systems@example.com');
    const admin = await signIn(url, 'admin@example.com');
    const controls = await signIn(url, 'controls@example.com');
    const line = await must(call(url, systems, 'POST', '/api/product-lines', { name: `Load bench ${Date.now().toString(36)}`, description: 'bench/load.ts' }), 201, 'product line');
    const set = await must(call(url, systems, 'POST', `/api/product-lines/${line.id}/requirement-sets`, { name: 'Load', purpose: '' }), 201, 'requirement set');
    const rev = await must(call(url, systems, 'POST', `/api/requirement-sets/${set.id}/revisions`, { requirements: LIMITS, rationale: 'load bench' }), 201, 'revision');
    await must(call(url, systems, 'POST', `/api/revisions/${rev.id}/submit`), 200, 'submit');
    await must(call(url, admin, 'POST', `/api/revisions/${rev.id}/approve`, { password: 'polecourt-demo', impactAcknowledged: true }), 200, 'approve');
    const candidate = await must(call(url, controls, 'POST', `/api/product-lines/${line.id}/candidates`, { name: 'Load candidate', notes: '', design: DESIGN }), 201, 'candidate');

    let headers: Record<string, string>;
    if (AUTH === 'token') {
      const t = await must(call(url, controls, 'POST', '/api/tokens', { name: 'load bench', expiresInDays: 1 }), 201, 'token');
      headers = { authorization: `Bearer ${t.secret}` };
    } else {
      headers = { cookie: controls.cookie, 'x-csrf-token': controls.csrf };
    }

    const regionOpts = { url: `${url}/api/revisions/${rev.id}/region`, connections: CONNECTIONS, headers };
    const assessOpts = {
      url: `${url}/api/candidates/${candidate.id}/assessments`,
      method: 'POST' as const,
      connections: CONNECTIONS,
      headers: { ...headers, 'content-type': 'application/json' },
      body: JSON.stringify({ revisionId: rev.id }),
    };
    const measured: { name: string; target: number; result: LoadResult }[] = [];
    if (ROUTES.has('floor')) {
      const floor = await startFloor();
      try {
        const opts = { url: `${floor.url}/`, connections: CONNECTIONS, headers: {} };
        report('floor: bare node:http server, fixed body (no Express, session or database)', await run({ ...opts, duration: SECONDS, warmup: WARMUP, apiPid: floor.child.pid! }));
      } finally {
        floor.child.kill('SIGTERM');
      }
    }
    for (const [key, name, opts, target] of [
      ['region', 'GET /api/revisions/:id/region', regionOpts, 50],
      ['assessments', 'POST /api/candidates/:id/assessments', assessOpts, 100],
    ] as const) {
      if (!ROUTES.has(key)) continue;
      // Assessments commit durably: the data disk's flush times go beside their figures.
      const disk = key === 'assessments' ? delay(WARMUP * 1000).then(() => probeDisk(dataDir(), SECONDS * 1000)) : null;
      const result = await run({ ...opts, duration: SECONDS, warmup: WARMUP, apiPid: child.pid! });
      report(name, result);
      const d = await disk;
      if (d) {
        console.log(`  data disk over the measured seconds: a 4 KB write made durable (fdatasync) took p50 ${round1(d.p50)} ms, p99 ${round1(d.p99)} ms, max ${round1(d.max)} ms (${d.flushes} flushes)`);
      }
      measured.push({ name, target, result });
    }
    if (WARMUP > 0) {
      console.log(
        TOOL === 'autocannon'
          ? `(each run began with ${WARMUP} s of the same load on the same connections, not counted)`
          : `(each route had ${WARMUP} s of the same load first, in a wrk run of its own, not counted; the measured run opened its connections anew)`,
      );
    }
    const verdicts = measured.map(({ name, target, result }) => `${name.split(' ')[0]} ${name.includes('region') ? 'region' : 'assessments'} p99 < ${target} ms (${result.p99 < target ? 'met' : 'NOT met'})`);
    const errors = measured.reduce((n, m) => n + m.result.socketErrors + m.result.non2xx + m.result.timeouts, 0);
    console.log(`targets: ${verdicts.join(', ')}, zero errors (${errors === 0 ? 'met' : 'NOT met'})`);
    console.log(`load average after: ${load()} (the machine is shared: other work shows in these figures)`);
  } finally {
    child.kill('SIGTERM');
  }
}

await main();
