// Axis ticks at round numbers: the step is 1, 2 or 5 times a power of ten
// (chosen with the thresholds sqrt(50), sqrt(10), sqrt(2) on the ratio of the
// raw step to its power of ten, as d3-array's ticks does), and every tick is
// an integer times the step, computed as k * step (or k / (1/step) for steps
// below one) so float error never builds up along the axis.

export interface RoundTicks {
  step: number;
  values: number[];
  /** Digits after the decimal point that the step needs. */
  decimals: number;
}

const E10 = Math.sqrt(50);
const E5 = Math.sqrt(10);
const E2 = Math.sqrt(2);

export function axisTicks(min: number, max: number, count: number): RoundTicks {
  if (!(Number.isFinite(min) && Number.isFinite(max)) || !(count > 0) || max <= min) {
    return { step: Number.NaN, values: [], decimals: 0 };
  }
  const raw = (max - min) / count;
  const power = Math.floor(Math.log10(raw));
  const error = raw / 10 ** power;
  const factor = error >= E10 ? 10 : error >= E5 ? 5 : error >= E2 ? 2 : 1;
  let values: number[];
  let step: number;
  if (power < 0) {
    // Divide by an integer inverse: 1 / 0.1 is exact where 3 * 0.1 is not.
    const inverse = 10 ** -power / factor;
    step = 1 / inverse;
    const lo = Math.ceil(min * inverse - 1e-9);
    const hi = Math.floor(max * inverse + 1e-9);
    values = [];
    for (let k = lo; k <= hi; k++) values.push(k / inverse);
  } else {
    step = factor * 10 ** power;
    const lo = Math.ceil(min / step - 1e-9);
    const hi = Math.floor(max / step + 1e-9);
    values = [];
    for (let k = lo; k <= hi; k++) values.push(k * step);
  }
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  return { step, values: values.map((v) => (Object.is(v, -0) ? 0 : v)), decimals };
}

/** A tick label with the decimals its step needs and an ASCII minus sign. */
export function formatTick(value: number, decimals: number): string {
  const s = value.toFixed(decimals);
  return /^-0(\.0+)?$/.test(s) ? s.slice(1) : s;
}
