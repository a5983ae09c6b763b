import { spawn, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { assertClose } from '../test/asserts.js';

// The command-line tool, run as the built and bundled dist/cli.js in a child process.
const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const cli = join(root, 'dist', 'cli.js');
let dir = '';
vi.setConfig({ testTimeout: 60_000 });

function run(args: string[], input?: string): { status: number | null; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, [cli, ...args], { input, encoding: 'utf8', cwd: dir, maxBuffer: 1 << 28 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

function file(name: string, content: unknown): string {
  const path = join(dir, name);
  writeFileSync(path, typeof content === 'string' ? content : JSON.stringify(content));
  return path;
}

// T(s) = 100 / (s^2 + 15 s + 100): zeta 0.75, omega_n 10; %OS ≈ 2.838, Tp ≈ 0.475 s (Nise ch. 4 worked example, from memory).
const nise = { id: 'nise-4', numerator: [100], denominator: [1, 15, 100] };

beforeAll(() => {
  const tsc = join(root, 'node_modules', 'typescript', 'bin', 'tsc');
  const build = spawnSync(process.execPath, [tsc, '-p', join(root, 'tsconfig.build.json')], { encoding: 'utf8' });
  if (build.status !== 0) throw new Error(`build failed:\n${build.stdout}${build.stderr}`);
  // then the bundles users run (tsc alone would leave the per-module cli.js in their place)
  const bundle = spawnSync(process.execPath, [join(root, 'scripts', 'bundle-cli.mjs')], { encoding: 'utf8' });
  if (bundle.status !== 0) throw new Error(`bundling failed:\n${bundle.stdout}${bundle.stderr}`);
  dir = mkdtempSync(join(tmpdir(), 'polecourt-cli-'));
}, 120_000);

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

// Each case starts node; on a loaded machine that takes a while, hence the generous timeouts.
describe('polecourt region', () => {
  it('prints the bounds as JSON and exits 0: zeta >= 0.591 from 10 % (Nise ch. 4), sigma >= 4 / Ts (Ogata ch. 5)', () => {
    const r = run(['region', '--requirements', file('req.json', { maxOvershootPct: 10, maxSettlingTime: 2 })]);
    expect(r.status).toBe(0);
    const b = JSON.parse(r.stdout);
    assertClose(b.minDampingRatio, 0.591, 2e-3);
    assertClose(b.minDecayRate, 2, 1e-15);
    expect(b.minDampedFrequency).toBeNull();
    expect(b.riseTimeCurve).toEqual([]);
    expect(b.dominanceRatio).toBe(5);
    assertClose(b.settlingConstant, 4, 0);
  });

  it('reads the requirements from standard input with -', () => {
    const r = run(['region', '--requirements', '-'], JSON.stringify({ maxPeakTime: 0.5 }));
    expect(r.status).toBe(0);
    assertClose(JSON.parse(r.stdout).minDampedFrequency, Math.PI / 0.5, 1e-15);
  });

  it('rejects a bad requirement set with exit 2, an error object on stdout and the message on stderr', () => {
    const r = run(['region', '--requirements', file('bad.json', { maxOvershootPct: 150 })]);
    expect(r.status).toBe(2);
    const e = JSON.parse(r.stdout).error;
    expect(e.code).toBe('invalid_requirements');
    expect(e.path).toBe('maxOvershootPct');
    expect(r.stderr).toContain(e.message);
  });
});

describe('polecourt evaluate', () => {
  it('exits 0 for a compliant design and prints the assessment', () => {
    const r = run(['evaluate', '--design', file('d.json', nise), '--requirements', file('r.json', { maxOvershootPct: 5, maxPeakTime: 0.6 })]);
    expect(r.status).toBe(0);
    const a = JSON.parse(r.stdout);
    expect(a.id).toBe('nise-4');
    expect(a.verdict).toBe('compliant');
    assertClose(a.metrics.overshootPct, 2.838, 1e-3);
    assertClose(a.metrics.peakTime, 0.475, 2e-3);
  });

  it('exits 1 for a noncompliant design', () => {
    const r = run(['evaluate', '--design', file('d.json', nise), '--requirements', file('r.json', { maxOvershootPct: 2 })]);
    expect(r.status).toBe(1);
    expect(JSON.parse(r.stdout).verdict).toBe('noncompliant');
  });

  it('exits 0 with verdict null without requirements, reading the design from standard input', () => {
    const r = run(['evaluate', '--design', '-'], JSON.stringify(nise));
    expect(r.status).toBe(0);
    const a = JSON.parse(r.stdout);
    expect(a.verdict).toBeNull();
    expect(a.checks).toEqual([]);
  });

  it('exits 2 on a bad design, a file that is not JSON and a missing file', () => {
    for (const args of [
      ['--design', file('bad.json', { poles: 'none', gain: 1 })],
      ['--design', file('junk.json', '{ not json')],
      ['--design', join(dir, 'no-such-file.json')],
    ]) {
      const r = run(['evaluate', ...args]);
      expect(r.status).toBe(2);
      const e = JSON.parse(r.stdout).error;
      expect(typeof e.code).toBe('string');
      expect(r.stderr).toContain(e.message);
    }
  });
});

describe('polecourt batch', () => {
  const lines = [JSON.stringify(nise), '{ broken', JSON.stringify({ poles: [{ re: 1 }], gain: 1 }), JSON.stringify({ ...nise, id: 'last' })];

  it('prints one line per input line in order; bad lines give their error and the rest go on', () => {
    const r = run(['batch', '--designs', file('d.jsonl', lines.join('\n') + '\n'), '--requirements', file('r.json', { maxOvershootPct: 5 })]);
    const out = r.stdout.trimEnd().split('\n').map((l) => JSON.parse(l));
    expect(out.length).toBe(4);
    expect(out[0].id).toBe('nise-4');
    expect(out[0].verdict).toBe('compliant');
    expect(out[1].error.code).toBe('invalid_json');
    expect(out[1].error.line).toBe(2);
    expect(typeof out[2].error.code).toBe('string');
    expect(out[3].id).toBe('last');
    expect(r.status).toBe(1);
  });

  it('reads the designs from standard input and exits 0 when every line is compliant', () => {
    const r = run(['batch', '--designs', '-', '--requirements', file('r.json', { maxOvershootPct: 5 })], `${JSON.stringify(nise)}\r\n${JSON.stringify(nise)}\r\n`);
    expect(r.stdout.trimEnd().split('\n').length).toBe(2);
    expect(r.status).toBe(0);
  });

  it('handles a few thousand lines, one output line each, in order', () => {
    const many = Array.from({ length: 3000 }, (_, i) => JSON.stringify({ ...nise, id: `n${i}` })).join('\n');
    const r = run(['batch', '--designs', file('many.jsonl', many)]);
    const ids = r.stdout.trimEnd().split('\n').map((l) => JSON.parse(l).id);
    expect(ids.length).toBe(3000);
    expect(ids[2999]).toBe('n2999');
    expect(r.status).toBe(0);
  });

  it('keeps order and line numbers across the blocks that worker threads assess (a bad line deep in the input)', () => {
    // from standard input, whose length is not known ahead, so workers are used (a file this short stays on the main thread)
    const lines = Array.from({ length: 4500 }, (_, i) => (i === 2716 ? '{"poles": [' : JSON.stringify({ ...nise, id: `n${i}` })));
    const r = run(['batch', '--designs', '-'], lines.join('\n') + '\n');
    const out = r.stdout.trimEnd().split('\n').map((l) => JSON.parse(l));
    expect(out.length).toBe(4500);
    expect(out[2716].error.line).toBe(2717);
    expect(out[2715].id).toBe('n2715');
    expect(out[4499].id).toBe('n4499');
    expect(r.status).toBe(1);
  });

  it('stops quietly with exit 1 when the reader closes the output early (as | head does)', async () => {
    const lines = Array.from({ length: 4500 }, (_, i) => JSON.stringify({ ...nise, id: `n${i}` }));
    const child = spawn(process.execPath, [cli, 'batch', '--designs', '-'], { cwd: dir, stdio: ['pipe', 'pipe', 'pipe'] });
    let stderr = '';
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    // the first output closes the reading end; stdin errors once the child has gone
    child.stdin.on('error', () => {});
    child.stdout.once('data', () => child.stdout.destroy());
    child.stdin.end(lines.join('\n') + '\n');
    const [code, signal] = await new Promise<[number | null, string | null]>((done) => child.on('close', (c, s) => done([c, s])));
    expect(signal).toBeNull();
    expect(code).toBe(1);
    expect(stderr).toBe('');
  });
});

describe('polecourt usage', () => {
  it('exits 2 with an error object on an unknown command, an unknown flag, a missing flag or stdin twice', () => {
    const cases: [string[], string][] = [
      [['simulate'], 'unknown_command'],
      [[], 'missing_command'],
      [['evaluate', '--design', 'x.json', '--verbose'], 'unknown_flag'],
      [['evaluate'], 'missing_flag'],
      [['batch', '--designs', '-', '--requirements', '-'], 'stdin_twice'],
    ];
    for (const [args, code] of cases) {
      const r = run(args);
      expect(r.status, args.join(' ')).toBe(2);
      expect(JSON.parse(r.stdout).error.code).toBe(code);
      expect(r.stderr.length).toBeGreaterThan(0);
    }
  });

  it('prints the usage on stdout only when asked with --help', () => {
    const r = run(['--help']);
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/polecourt evaluate --design FILE/);
  });
});
