// Speed figures of the engine (plain numbers, no pass/fail):
//  1. median time of one full assessment of a sixth-order design;
//  2. wall time of `polecourt batch` on 10,000 sixth-order designs, process start included;
//  3. the same designs simulated on a 2,000-point grid by general-purpose
//     methods, metrics read off the samples, and the speed ratios (each method
//     timed best of 3 in three rounds that interleave every figure, on the first 2,000
//     designs, or 200 for odex, and scaled to 10,000):
//     a. ml-matrix throughout: exact zero-order-hold discretisation of the
//        controllable canonical realisation (matrix exponential of the augmented
//        matrix [[A, B], [0, 0]] h) and x <- Phi x + Gamma with Matrix.mmul per sample;
//     b. the same discretisation, stepped by a hand-written loop over Float64Arrays
//        (the fastest sampled variant we wrote, for an honest comparison);
//     c. odex (Hairer-Wanner ODEX, Gragg-Bulirsch-Stoer) with dense output on the
//        grid, tolerance 1e-10.
//  and, beside the batch, the I/O floor: bench/io-floor.mjs reads the same
//  designs and writes assessment-shaped JSON with no engine work, so the batch's
//  ratio can be read against the most any JSON-lines batch could reach here.
// Run with `pnpm bench` from the repository root (builds dist first).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { createRequire } from 'node:module';
import { Matrix, solve } from 'ml-matrix';
import { evaluate, parseDesign, parseRequirements } from '../dist/index.js';

const here = dirname(fileURLToPath(import.meta.url));
// odex ships CommonJS only.
const { Solver } = createRequire(import.meta.url)('odex');
const odexSolver = new Solver(6);
odexSolver.denseOutput = true;
odexSolver.absoluteTolerance = 1e-10;
odexSolver.relativeTolerance = 1e-10;
odexSolver.maxSteps = 1e6;
const cli = join(here, '..', 'dist', 'cli.js');
const ioFloor = join(here, 'io-floor.mjs');
const COUNT = 10_000;
const GRID = 2_000;

// Invented demo requirement set (the contract's example values).
const requirements = {
  maxOvershootPct: 10,
  maxSettlingTime: 1.2,
  maxPeakTime: 0.6,
  maxRiseTime: 0.3,
  minDampingRatio: 0.5,
  maxNaturalFrequency: 80,
};

// mulberry32: a small seeded generator, so every run benches the same designs.
function rng(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

// Sixth-order closed loops: a slow pair, a fast pair, two real poles, unit DC gain,
// a left-half-plane zero in every other design.
function designs(count) {
  const r = rng(20240611);
  const out = [];
  for (let i = 0; i < count; i++) {
    const u = (lo, hi) => lo + (hi - lo) * r();
    const pair = (zeta, wn) => [
      { re: -zeta * wn, im: wn * Math.sqrt(1 - zeta * zeta) },
      { re: -zeta * wn, im: -wn * Math.sqrt(1 - zeta * zeta) },
    ];
    const poles = [...pair(u(0.35, 0.85), u(4, 12)), ...pair(u(0.3, 0.8), u(25, 70)), { re: -u(20, 60), im: 0 }, { re: -u(60, 150), im: 0 }];
    const zeros = i % 2 === 0 ? [{ re: -u(15, 60), im: 0 }] : [];
    let gain = 1;
    for (const p of poles) gain *= Math.hypot(p.re, p.im);
    for (const z of zeros) gain /= Math.abs(z.re);
    out.push({ id: `bench-${i}`, poles, zeros, gain });
  }
  return out;
}

function median(xs) {
  const s = [...xs].sort((a, b) => a - b);
  return s[s.length >> 1];
}

// exp(X) by scaling and squaring with the (6, 6) Pade approximant (Moler & Van
// Loan, "Nineteen dubious ways to compute the exponential of a matrix", 2003).
function expm(X) {
  const n = X.rows;
  let norm = 0;
  for (let i = 0; i < n; i++) {
    let row = 0;
    for (let j = 0; j < n; j++) row += Math.abs(X.get(i, j));
    norm = Math.max(norm, row);
  }
  const s = Math.max(0, Math.ceil(Math.log2(norm / 0.5)));
  const A = X.clone().mul(2 ** -s);
  const q = 6;
  let c = 1;
  let term = Matrix.eye(n);
  let N = Matrix.eye(n);
  let D = Matrix.eye(n);
  for (let k = 1; k <= q; k++) {
    c = (c * (q - k + 1)) / (k * (2 * q - k + 1));
    term = term.mmul(A);
    N = N.add(term.clone().mul(c));
    D = D.add(term.clone().mul((k % 2 === 0 ? 1 : -1) * c));
  }
  let E = solve(D, N);
  for (let k = 0; k < s; k++) E = E.mmul(E);
  return E;
}

// Step response on GRID samples from the controllable canonical realisation of
// num/den (den monic), and the metrics read off the samples.
function sampledMetrics(model, bandPct, mode) {
  const den = model.denominator;
  const n = den.length - 1;
  const num = new Array(n + 1 - model.numerator.length).fill(0).concat(model.numerator);
  const b0 = num[0];
  const c = []; // C = [c_n ... c_1] with c_i = b_i - a_i b0
  for (let i = n; i >= 1; i--) c.push(num[i] - den[i] * b0);
  const slowest = Math.min(...model.poles.map((p) => Math.abs(p.re)));
  const tEnd = 10 / slowest;
  const h = tEnd / (GRID - 1);
  const M = new Matrix(n + 1, n + 1);
  for (let i = 0; i + 1 < n; i++) M.set(i, i + 1, 1);
  for (let j = 0; j < n; j++) M.set(n - 1, j, -den[n - j]);
  M.set(n - 1, n, 1);
  const y = new Float64Array(GRID);
  if (mode === 'odex') {
    const f = (_t, x) => {
      const d = new Array(n);
      for (let i = 0; i + 1 < n; i++) d[i] = x[i + 1];
      let v = 1;
      for (let j = 0; j < n; j++) v -= den[n - j] * x[j];
      d[n - 1] = v;
      return d;
    };
    let k = 0;
    odexSolver.solve(
      f,
      0,
      new Array(n).fill(0),
      tEnd,
      odexSolver.grid(h, (_t, x) => {
        if (k >= GRID) return;
        let out = b0;
        for (let i = 0; i < n; i++) out += c[i] * x[i];
        y[k++] = out;
      }),
    );
  } else {
    const E = expm(M.mul(h));
    if (mode === 'ml-matrix') {
      const Phi = E.subMatrix(0, n - 1, 0, n - 1);
      const Gam = E.subMatrix(0, n - 1, n, n);
      const Cm = new Matrix([c]);
      let x = Matrix.zeros(n, 1);
      for (let k = 0; k < GRID; k++) {
        y[k] = b0 + Cm.mmul(x).get(0, 0);
        x = Phi.mmul(x).add(Gam);
      }
    } else {
      const phi = new Float64Array(n * n);
      const gam = new Float64Array(n);
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) phi[i * n + j] = E.get(i, j);
        gam[i] = E.get(i, n);
      }
      let x = new Float64Array(n);
      let next = new Float64Array(n);
      for (let k = 0; k < GRID; k++) {
        let out = b0;
        for (let i = 0; i < n; i++) out += c[i] * x[i];
        y[k] = out;
        for (let i = 0; i < n; i++) {
          let v = gam[i];
          for (let j = 0; j < n; j++) v += phi[i * n + j] * x[j];
          next[i] = v;
        }
        [x, next] = [next, x];
      }
    }
  }
  const yf = num[n] / den[n];
  let max = -Infinity;
  let kMax = 0;
  for (let k = 0; k < GRID; k++) if (y[k] > max) ((max = y[k]), (kMax = k));
  const overshootPct = Math.max(0, (max / yf - 1) * 100);
  let kSettle = 0;
  for (let k = GRID - 1; k >= 0; k--) {
    if (Math.abs(y[k] / yf - 1) > bandPct / 100) {
      kSettle = k + 1;
      break;
    }
  }
  const cross = (level) => {
    for (let k = 1; k < GRID; k++) {
      if (y[k] / yf >= level) return (k - 1 + (level - y[k - 1] / yf) / ((y[k] - y[k - 1]) / yf)) * h;
    }
    return null;
  };
  const t10 = cross(0.1);
  const t90 = cross(0.9);
  return {
    overshootPct,
    peakTime: overshootPct > 0 ? kMax * h : null,
    settlingTime: kSettle * h,
    riseTime: t10 !== null && t90 !== null ? t90 - t10 : null,
  };
}

const all = designs(COUNT);
const dir = mkdtempSync(join(tmpdir(), 'polecourt-bench-'));
try {
  // 1. one full assessment (checking the design and the requirement set included)
  for (let i = 0; i < 2000; i++) evaluate(all[i % COUNT], requirements);
  const single = [];
  for (let i = 0; i < 20000; i++) {
    const d = all[i % COUNT];
    const t0 = process.hrtime.bigint();
    evaluate(d, requirements);
    single.push(Number(process.hrtime.bigint() - t0) / 1000);
  }
  console.log(`1. one full assessment of a sixth-order design: median ${median(single).toFixed(1)} us (target < 100 us)`);

  // Three rounds, each timing every figure once in turn (the engine in process,
  // the batch, the I/O floor, then each grid method), and each figure the best
  // of its three: on a shared machine the fastest run is the least disturbed
  // one, and interleaving lets a slow moment fall on all of them alike rather
  // than on whichever was timed then.
  const designsFile = join(dir, 'designs.jsonl');
  const reqFile = join(dir, 'requirements.json');
  writeFileSync(designsFile, all.map((d) => JSON.stringify(d)).join('\n') + '\n');
  writeFileSync(reqFile, JSON.stringify(requirements));
  const req = parseRequirements(requirements);
  const models = all.map((d) => parseDesign(d));
  // The slow grid methods run on the first designs only, scaled to 10,000
  // (every design has the same order and grid, so the cost per design does
  // not depend on which).
  const mlCount = 2_000;
  const odexCount = 200;
  const gridRun = (mode, count) => {
    const list = models.slice(0, count);
    const s = performance.now();
    const out = list.map((m) => sampledMetrics(m, req.settlingBandPct, mode));
    return [((performance.now() - s) * COUNT) / count, out];
  };
  // a child process's wall time, process start included, and its output
  const spawnTimed = (args) => {
    const s = performance.now();
    const res = spawnSync(process.execPath, args, { maxBuffer: 1 << 30, encoding: 'utf8' });
    return { ms: performance.now() - s, res };
  };
  let assessments = [];
  let sampled = [];
  let odexSampled = [];
  const engineRuns = [];
  const wall = [];
  const floorWall = [];
  const mlRuns = [];
  const loopRuns = [];
  const odexRuns = [];
  let lines = 0;
  let bytes = 0;
  let floorBytes = 0;
  for (let run = 0; run < 3; run++) {
    const s = performance.now();
    assessments = all.map((d) => evaluate(d, requirements));
    engineRuns.push(performance.now() - s);
    const batch = spawnTimed([cli, 'batch', '--designs', designsFile, '--requirements', reqFile]);
    wall.push(batch.ms);
    if (batch.res.status === 2 || batch.res.status === 3) throw new Error(`batch failed: ${batch.res.stderr}`);
    lines = batch.res.stdout.split('\n').filter((l) => l.length > 0).length;
    bytes = batch.res.stdout.length;
    const floor = spawnTimed([ioFloor, designsFile, reqFile]);
    floorWall.push(floor.ms);
    if (floor.res.status !== 0) throw new Error(`io floor failed: ${floor.res.stderr}`);
    floorBytes = floor.res.stdout.length;
    let ms;
    [ms, sampled] = gridRun('ml-matrix', mlCount);
    mlRuns.push(ms);
    [ms] = gridRun('loop', mlCount);
    loopRuns.push(ms);
    [ms, odexSampled] = gridRun('odex', odexCount);
    odexRuns.push(ms);
  }
  const engineMs = Math.min(...engineRuns);
  console.log(`   10,000 assessments in process: ${engineMs.toFixed(0)} ms (best of 3; median ${median(engineRuns).toFixed(0)} ms)`);
  console.log(
    `2. polecourt batch, 10,000 sixth-order designs: ${(Math.min(...wall) / 1000).toFixed(2)} s wall, best of 3 (median ${(median(wall) / 1000).toFixed(2)} s; target < 2 s; ${lines} lines out, ${(bytes / 1e6).toFixed(1)} MB)`,
  );
  console.log(
    `   I/O floor (bench/io-floor.mjs: the same lines read and ${(floorBytes / 1e6).toFixed(1)} MB of assessment-shaped JSON written, no engine work): ${(Math.min(...floorWall) / 1000).toFixed(2)} s wall, best of 3 (median ${(median(floorWall) / 1000).toFixed(2)} s)`,
  );
  const mlMs = Math.min(...mlRuns);
  const loopMs = Math.min(...loopRuns);
  const odexMs = Math.min(...odexRuns);
  const batchMs = Math.min(...wall);
  const line = (label, ms) =>
    console.log(
      `   ${label}: ${(ms / 1000).toFixed(2)} s; ratio to the engine in process ${(ms / engineMs).toFixed(1)}x, to polecourt batch ${(ms / batchMs).toFixed(1)}x`,
    );
  console.log('3. the designs on a 2,000-point grid, metrics off the samples (best of 3; target ratio >= 20x):');
  line(`a. ml-matrix expm + Matrix.mmul per sample, ${mlCount.toLocaleString('en')} designs timed, scaled to 10,000`, mlMs);
  line(`b. ml-matrix expm + hand-written stepping loop, ${mlCount.toLocaleString('en')} designs timed, scaled to 10,000`, loopMs);
  line(`c. odex, ${odexCount} designs timed, scaled to 10,000`, odexMs);
  const spread = (runs) => {
    const r = runs.map((ms, i) => ms / wall[i]);
    return `${Math.min(...r).toFixed(1)} to ${Math.max(...r).toFixed(1)}x`;
  };
  console.log(`   round by round, polecourt batch against a: ${spread(mlRuns)}, b: ${spread(loopRuns)}, c: ${spread(odexRuns)}`);
  const floorMs = Math.min(...floorWall);
  console.log(
    `   the I/O floor alone is ${(mlMs / floorMs).toFixed(1)}x (a), ${(loopMs / floorMs).toFixed(1)}x (b) and ${(odexMs / floorMs).toFixed(1)}x (c) faster than the grid: no batch that reads and writes these JSON lines can beat those ratios here`,
  );
  let odexWorst = 0;
  odexSampled.forEach((s, i) => (odexWorst = Math.max(odexWorst, Math.abs(s.overshootPct - sampled[i].overshootPct))));
  console.log(`   odex and expm samples agree on overshoot to ${odexWorst.toExponential(1)} points`);

  // How far the samples are from the exact metrics, for scale.
  const dOs = [];
  const dTs = [];
  const dTr = [];
  sampled.forEach((s, i) => {
    const m = assessments[i].metrics;
    if (!m) return;
    dOs.push(Math.abs(s.overshootPct - m.overshootPct));
    dTs.push(Math.abs(s.settlingTime - m.settlingTime) / m.settlingTime);
    if (s.riseTime !== null && m.riseTime !== null) dTr.push(Math.abs(s.riseTime - m.riseTime) / m.riseTime);
  });
  console.log(
    `   grid against exact (first ${mlCount.toLocaleString('en')} designs): overshoot |diff| median ${median(dOs).toExponential(2)} points, max ${Math.max(...dOs).toExponential(2)}; ` +
      `settling time median ${median(dTs).toExponential(2)}, max ${Math.max(...dTs).toExponential(2)} relative; ` +
      `rise time median ${median(dTr).toExponential(2)} relative`,
  );
} finally {
  rmSync(dir, { recursive: true, force: true });
}
