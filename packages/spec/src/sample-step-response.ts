// Step-response samples for plotting, adaptive: a uniform start (integer
// multiples of the step, so no float drift) and then repeated halving of the
// interval whose midpoint is farthest from the chord, so points gather where
// the curve bends. Default window: 1.5x the 2 % settling time (stable), a
// short window showing the growth (unstable: 4 time constants of the
// rightmost pole), or a few periods / time constants (marginal).
import type { Model } from './types.js';
import { stepResponse } from './step-response.js';
import { computeStepMetrics } from './step-metrics.js';
import { stability } from './is-stable.js';
import { axisTolerance } from './axis-tolerance.js';
import { packResponse } from './pack-response.js';
import { transientBound, transientHorizon } from './transient-horizon.js';

export function sampleStepResponse(
  model: Model,
  options: { tEnd?: number; maxPoints?: number } = {},
): { t: number[]; y: number[]; tEnd: number } {
  const maxPoints = Math.max(2, Math.floor(options.maxPoints ?? 400));
  const response = stepResponse(model);
  const tEnd = options.tEnd !== undefined && options.tEnd > 0 ? options.tEnd : defaultWindow(model, response.modal);
  const n0 = Math.max(2, Math.min(maxPoints, Math.ceil(maxPoints / 4)));
  const t: number[] = [];
  const y: number[] = [];
  const step = tEnd / (n0 - 1);
  for (let i = 0; i < n0; i++) {
    const ti = i === n0 - 1 ? tEnd : i * step;
    t.push(ti);
    y.push(response.value(ti));
  }
  // midpoint deviation of each interval [t_i, t_{i+1}]
  const midT: number[] = [];
  const midY: number[] = [];
  const err: number[] = [];
  const measure = (i: number) => {
    const a = t[i] as number;
    const b = t[i + 1] as number;
    const m = 0.5 * (a + b);
    const ym = response.value(m);
    midT[i] = m;
    midY[i] = ym;
    err[i] = Math.abs(ym - 0.5 * ((y[i] as number) + (y[i + 1] as number)));
  };
  for (let i = 0; i + 1 < t.length; i++) measure(i);
  while (t.length < maxPoints) {
    let worst = -1;
    let worstErr = 0;
    for (let i = 0; i < err.length; i++) {
      if ((err[i] as number) > worstErr) {
        worstErr = err[i] as number;
        worst = i;
      }
    }
    if (worst < 0) break; // a straight line: nothing left to refine
    t.splice(worst + 1, 0, midT[worst] as number);
    y.splice(worst + 1, 0, midY[worst] as number);
    midT.splice(worst + 1, 0, 0);
    midY.splice(worst + 1, 0, 0);
    err.splice(worst + 1, 0, 0);
    measure(worst);
    measure(worst + 1);
  }
  return { t, y, tEnd };
}

function defaultWindow(model: Model, modal: ReturnType<typeof stepResponse>['modal']): number {
  const poles = model.poles;
  if (poles.length === 0) return 1;
  const tol = axisTolerance(poles);
  const st = stability(model);
  const rightmost = Math.max(...poles.map((p) => p.re));
  if (!st.stable && rightmost > tol) return 4 / rightmost;
  if (!st.stable) {
    // marginal: a few periods of the axis poles, a few time constants of the rest
    let w = 0;
    for (const p of poles) {
      if (Math.abs(p.re) <= tol && Math.abs(p.im) > tol) w = Math.max(w, (6 * Math.PI) / Math.abs(p.im));
      if (p.re < -tol) w = Math.max(w, 6 / -p.re);
    }
    return w > 0 ? w : 10;
  }
  const { metrics } = computeStepMetrics(model, 2);
  if (metrics && metrics.settlingTime > 0) return 1.5 * metrics.settlingTime;
  // zero final value or instant settling: until the transient is 1 % of its start
  const packed = packResponse(modal, 1);
  const start = transientBound(packed, 0) || 1;
  const scaled = packResponse(modal, 1 / start);
  const horizon = transientHorizon(scaled, 0.01);
  return horizon > 0 ? horizon : 1;
}
