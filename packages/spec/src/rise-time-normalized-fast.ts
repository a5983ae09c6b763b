import { riseTimeNormalized } from './rise-time-normalized.js';
import { standardStepCrossing } from './standard-step-crossing.js';
import { standardStepResponse } from './standard-step-response.js';

// Fast normalized 10-90 % rise time: cubic Hermite interpolation on a table of
// exact values and exact slopes over zeta in [0, 3] (step 0.01), built once on
// first use. The slope of a crossing time t_L(zeta) comes from implicit
// differentiation of y(t_L, zeta) = L: dt_L/dzeta = -(dy/dzeta) / (dy/dt).
// Interpolation error is far below 1e-6 relative (tested against the exact
// function); outside the table the exact root finder is used.
const STEP = 0.01;
const COUNT = 301; // zeta = 0, 0.01, ..., 3 as integers times STEP
const ZETA_MAX = STEP * (COUNT - 1);

let values: Float64Array | null = null;
let slopes: Float64Array | null = null;

function crossingWithSlope(zeta: number, level: number): [number, number] {
  const t = standardStepCrossing(zeta, level);
  const p = standardStepResponse(zeta, t);
  return [t, -p.dydzeta / p.dydt];
}

function buildTable(): void {
  values = new Float64Array(COUNT);
  slopes = new Float64Array(COUNT);
  for (let i = 0; i < COUNT; i++) {
    const zeta = i * STEP;
    const [t10, d10] = crossingWithSlope(zeta, 0.1);
    const [t90, d90] = crossingWithSlope(zeta, 0.9);
    values[i] = t90 - t10;
    slopes[i] = d90 - d10;
  }
}

export function riseTimeNormalizedFast(dampingRatio: number): number {
  if (!(dampingRatio >= 0 && dampingRatio <= ZETA_MAX)) return riseTimeNormalized(dampingRatio);
  if (values === null || slopes === null) buildTable();
  const v = values as Float64Array;
  const d = slopes as Float64Array;
  const i = Math.min(Math.floor(dampingRatio / STEP), COUNT - 2);
  const s = dampingRatio / STEP - i;
  const s2 = s * s;
  const s3 = s2 * s;
  const h00 = 2 * s3 - 3 * s2 + 1;
  const h10 = s3 - 2 * s2 + s;
  const h01 = -2 * s3 + 3 * s2;
  const h11 = s3 - s2;
  return (v[i] as number) * h00 + STEP * (d[i] as number) * h10 + (v[i + 1] as number) * h01 + STEP * (d[i + 1] as number) * h11;
}
