// Reference step response by another method: the controllable canonical
// state-space realisation of num/den integrated by odex 2.0.4 (Hairer's ODEX,
// Gragg–Bulirsch–Stoer extrapolation) with its dense output, tolerance 1e-12.
// referenceMetrics reads the metrics off dense samples of that solution,
// refined by a parabola through the three samples around each extremum and
// linear interpolation at each crossing.
import { createRequire } from 'node:module';

// odex ships its TypeScript source beside the JavaScript, and tsc would
// type-check that source under our strict settings; load it through require
// with the small part of its API used here typed locally.
interface OdexSolver {
  absoluteTolerance: number;
  relativeTolerance: number;
  denseOutput: boolean;
  maxSteps: number;
  solve(
    f: (x: number, y: number[]) => number[],
    x: number,
    y0: number[],
    xEnd: number,
    out: (nr: number, xOld: number, x: number, y: number[], dense?: (c: number, x: number) => number) => boolean | void,
  ): { y: number[] };
}
const { Solver } = createRequire(import.meta.url)('odex') as { Solver: new (n: number) => OdexSolver };

export function odeStepResponse(numerator: readonly number[], denominator: readonly number[], times: readonly number[]): number[] {
  const lead = denominator[0] as number;
  const a = denominator.map((v) => v / lead);
  const n = a.length - 1;
  const b = new Array<number>(n + 1 - numerator.length).fill(0).concat(numerator.map((v) => v / lead));
  const d = b[0] as number;
  const rem = b.map((v, i) => v - d * (a[i] as number)); // strictly proper remainder, rem[0] = 0
  // x1 = 1/den(s) u, x_k = s^(k-1) x1, y = sum rem[n+1-k] x_k + d u
  const f = (_t: number, x: number[]): number[] => {
    const dx = new Array<number>(n);
    for (let k = 0; k < n - 1; k++) dx[k] = x[k + 1] as number;
    let last = 1;
    for (let k = 0; k < n; k++) last -= (a[n - k] as number) * (x[k] as number);
    dx[n - 1] = last;
    return dx;
  };
  const output = (x: number[]): number => {
    let y = d;
    for (let k = 0; k < n; k++) y += (rem[n - k] as number) * (x[k] as number);
    return y;
  };
  if (n === 0) return times.map(() => d);
  const sorted = [...times].map((t, i) => ({ t, i })).sort((p, q) => p.t - q.t);
  const result = new Array<number>(times.length).fill(Number.NaN);
  const solver = new Solver(n);
  solver.absoluteTolerance = 1e-13;
  solver.relativeTolerance = 1e-13;
  solver.denseOutput = true;
  solver.maxSteps = 1_000_000;
  let next = 0;
  const tEnd = sorted[sorted.length - 1]?.t ?? 0;
  const x0 = new Array<number>(n).fill(0);
  while (next < sorted.length && (sorted[next]?.t as number) <= 0) {
    result[(sorted[next] as { i: number }).i] = d;
    next++;
  }
  solver.solve(f, 0, x0, tEnd, (_nr, xOld, x, _y, dense) => {
    while (next < sorted.length && (sorted[next]?.t as number) <= x) {
      const s = sorted[next] as { t: number; i: number };
      const state = Array.from({ length: n }, (_, k) => (dense as (c: number, x: number) => number)(k, s.t));
      result[s.i] = output(state);
      next++;
    }
    void xOld;
  });
  return result;
}

export interface ReferenceMetrics {
  overshootPct: number;
  undershootPct: number;
  peakTime: number | null;
  settlingTime: number;
  riseTime: number;
}

export function referenceMetrics(
  numerator: readonly number[],
  denominator: readonly number[],
  finalValue: number,
  bandPct: number,
  tEnd: number,
  samples = 20000,
): ReferenceMetrics {
  const times = Array.from({ length: samples + 1 }, (_, i) => (i * tEnd) / samples);
  const r = odeStepResponse(numerator, denominator, times).map((y) => y / finalValue);
  const band = bandPct / 100;
  let iMax = 0;
  let iMin = 0;
  r.forEach((v, i) => {
    if (v > (r[iMax] as number)) iMax = i;
    if (v < (r[iMin] as number)) iMin = i;
  });
  const vertex = (i: number): { t: number; v: number } => {
    if (i === 0 || i === samples) return { t: times[i] as number, v: r[i] as number };
    const y0 = r[i - 1] as number;
    const y1 = r[i] as number;
    const y2 = r[i + 1] as number;
    const h = tEnd / samples;
    const den = y0 - 2 * y1 + y2;
    const off = den === 0 ? 0 : (0.5 * (y0 - y2)) / den;
    return { t: (times[i] as number) + off * h, v: y1 - 0.25 * (y0 - y2) * off };
  };
  const max = vertex(iMax);
  const min = vertex(iMin);
  const crossing = (level: number): number => {
    if ((r[0] as number) >= level) return 0;
    for (let i = 1; i <= samples; i++) {
      if ((r[i] as number) >= level) {
        const y0 = r[i - 1] as number;
        const y1 = r[i] as number;
        return (times[i - 1] as number) + ((level - y0) / (y1 - y0)) * (tEnd / samples);
      }
    }
    return Number.NaN;
  };
  let settle = 0;
  for (let i = samples; i >= 0; i--) {
    if (Math.abs((r[i] as number) - 1) >= band) {
      if (i === samples) {
        settle = Number.NaN;
        break;
      }
      const e0 = Math.abs((r[i] as number) - 1);
      const e1 = Math.abs((r[i + 1] as number) - 1);
      settle = (times[i] as number) + ((e0 - band) / (e0 - e1)) * (tEnd / samples);
      break;
    }
  }
  const overshoot = Math.max(0, max.v - 1) * 100;
  return {
    overshootPct: overshoot,
    undershootPct: Math.max(0, -min.v) * 100,
    peakTime: overshoot > 0 ? max.t : null,
    settlingTime: settle,
    riseTime: crossing(0.9) - crossing(0.1),
  };
}
