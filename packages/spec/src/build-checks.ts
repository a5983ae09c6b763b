import type { ResolvedRequirements } from './parse-requirements.js';
import { tightenLimits, type Limits } from './tighten-limits.js';
import type { Check, Dominance, Estimate, StepMetrics } from './types.js';

export interface CheckInputs {
  requirements: ResolvedRequirements;
  stable: boolean;
  /** Why the model is not stable, in plain words. */
  stabilityReason?: string;
  metrics: StepMetrics | null;
  /** Why there are no exact metrics although the model is stable. */
  metricsReason?: string;
  dominance: Dominance | null;
  estimate: Estimate | null;
}

type LimitKey = keyof Limits;

const ORDER: LimitKey[] = [
  'maxOvershootPct',
  'maxSettlingTime',
  'maxPeakTime',
  'maxRiseTime',
  'minDampingRatio',
  'maxNaturalFrequency',
];

const NAME: Record<LimitKey, string> = {
  maxOvershootPct: 'overshoot',
  maxSettlingTime: 'settling time',
  maxPeakTime: 'peak time',
  maxRiseTime: '10-90 % rise time',
  minDampingRatio: 'damping ratio',
  maxNaturalFrequency: 'natural frequency',
};

const METRIC = {
  maxOvershootPct: 'overshootPct',
  maxSettlingTime: 'settlingTime',
  maxPeakTime: 'peakTime',
  maxRiseTime: 'riseTime',
} as const;

// One check per limit present, in a fixed order. The value is the exact
// step-response metric (for the damping floor and the natural-frequency
// ceiling: the dominant pole pair's own value), the estimate is the
// second-order view's. The status compares the value with the limit tightened
// by marginPct; the check's marginPct says how far inside the written limit
// the value is, in percent of the limit (limit 10, value 9.5 -> 5). A
// peak-time limit on a response that does not overshoot is n/a.
export function buildChecks(inputs: CheckInputs): Check[] {
  const { requirements: req, metrics, dominance, estimate } = inputs;
  const effective = tightenLimits(req);
  const checks: Check[] = [];
  for (const key of ORDER) {
    const limit = req[key];
    const effectiveLimit = effective[key];
    if (limit === undefined || effectiveLimit === undefined) continue;
    // Plain literals rather than object spreads: this runs for every design of a batch.
    const check = (value: number | null, estimate: number | null, status: Check['status'], marginPct: number | null, reason?: string): Check => {
      const c: Check = { requirement: key, limit, effectiveLimit, value, estimate, status, marginPct };
      if (reason !== undefined) c.reason = reason;
      return c;
    };
    if (!inputs.stable) {
      const why = inputs.stabilityReason ? `: ${inputs.stabilityReason}` : '';
      checks.push(check(null, null, 'fail', null, `the model is not stable${why}; its step response has no ${NAME[key]} to meet the limit`));
      continue;
    }
    const isFloor = key === 'minDampingRatio';
    let value: number | null;
    let est: number | null;
    let note: string | undefined;
    if (key === 'minDampingRatio' || key === 'maxNaturalFrequency') {
      value = key === 'minDampingRatio' ? (dominance?.dampingRatio ?? null) : (dominance?.naturalFrequency ?? null);
      const real = dominance?.poles.length === 1 && dominance.poles[0]?.im === 0;
      if (key === 'minDampingRatio' && value === null && real) {
        // A real dominant pole does not oscillate: the region reads a point on
        // the real axis as zeta = 1, and so does the check.
        value = 1;
        note = 'the dominant pole is real (no oscillation), read as damping ratio 1';
      }
      est = value; // the second-order view reads these straight off the dominant pole(s)
    } else {
      const field = METRIC[key];
      value = metrics ? metrics[field] : null;
      est = estimate ? estimate[field] : null;
    }
    if (value === null) {
      let status: Check['status'] = 'fail';
      let reason: string;
      if (key === 'maxPeakTime' && metrics !== null) {
        status = 'n/a';
        reason = 'the response does not overshoot, so it has no peak time';
      } else if (metrics === null && !isFloor && key !== 'maxNaturalFrequency') {
        reason = `there are no exact step-response metrics${inputs.metricsReason ? `: ${inputs.metricsReason}` : ''}`;
      } else if (isFloor || key === 'maxNaturalFrequency') {
        reason = `the model has no dominant pole to read the ${NAME[key]} from`;
      } else {
        reason = `the exact step response has no ${NAME[key]}`;
      }
      checks.push(check(null, est, status, null, reason));
      continue;
    }
    const pass = isFloor ? value >= effectiveLimit : value <= effectiveLimit;
    const marginPct = ((isFloor ? value - limit : limit - value) / limit) * 100;
    checks.push(check(value, est, pass ? 'pass' : 'fail', marginPct, note));
  }
  return checks;
}
