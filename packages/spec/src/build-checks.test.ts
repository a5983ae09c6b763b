import { describe, expect, it } from 'vitest';
import { assertClose } from '../test/asserts.js';
import { buildChecks, type CheckInputs } from './build-checks.js';
import { parseRequirements } from './parse-requirements.js';
import type { Dominance, StepMetrics } from './types.js';

const metrics: StepMetrics = {
  finalValue: 1,
  overshootPct: 9.5,
  undershootPct: 0,
  peakTime: 0.52,
  settlingTime: 1.1,
  settlingBandPct: 2,
  riseTime: 0.21,
};
const dominance: Dominance = {
  poles: [
    { re: -3.66, im: 4.88 },
    { re: -3.66, im: -4.88 },
  ],
  dampingRatio: 0.6,
  naturalFrequency: 6.1,
  ratio: 7.5,
  zeroRatio: null,
  approximationValid: true,
  notes: [],
};
const estimate = { overshootPct: 9.48, peakTime: 0.51, settlingTime: 1.09, riseTime: 0.2 };

function inputs(req: unknown, over: Partial<CheckInputs> = {}): CheckInputs {
  return { requirements: parseRequirements(req), stable: true, metrics, dominance, estimate, ...over };
}

describe('buildChecks', () => {
  it('reads the contract example: limit 10, value 9.5 -> pass with marginPct 5.0', () => {
    const [c] = buildChecks(inputs({ maxOvershootPct: 10 }));
    expect(c).toMatchObject({ requirement: 'maxOvershootPct', limit: 10, value: 9.5, estimate: 9.48, status: 'pass' });
    assertClose(c?.marginPct, 5, 1e-12);
  });

  it('makes one check per limit present, in a fixed order, with values from the exact metrics and the dominant pair', () => {
    const checks = buildChecks(
      inputs({ maxNaturalFrequency: 80, minDampingRatio: 0.5, maxRiseTime: 0.3, maxPeakTime: 0.6, maxSettlingTime: 1.2, maxOvershootPct: 10 }),
    );
    expect(checks.map((c) => c.requirement)).toEqual([
      'maxOvershootPct',
      'maxSettlingTime',
      'maxPeakTime',
      'maxRiseTime',
      'minDampingRatio',
      'maxNaturalFrequency',
    ]);
    expect(checks.map((c) => c.value)).toEqual([9.5, 1.1, 0.52, 0.21, 0.6, 6.1]);
    expect(checks.every((c) => c.status === 'pass')).toBe(true);
    assertClose(checks[4]?.marginPct, 20, 1e-12); // (0.6 - 0.5) / 0.5
  });

  it('tightens every limit by marginPct for the status but measures marginPct against the written limit', () => {
    const [os, damping] = buildChecks(inputs({ maxOvershootPct: 10, minDampingRatio: 0.58, marginPct: 6 }));
    // 9.5 > 10 x 0.94 = 9.4: fails the tightened limit though 5 % inside the written one
    expect(os?.status).toBe('fail');
    assertClose(os?.marginPct, 5, 1e-12);
    assertClose(os?.effectiveLimit, 9.4, 1e-14);
    // 0.6 < 0.58 x 1.06 = 0.6148
    expect(damping?.status).toBe('fail');
  });

  it('marks a peak-time limit n/a on a response that does not overshoot', () => {
    const [c] = buildChecks(inputs({ maxPeakTime: 0.5 }, { metrics: { ...metrics, overshootPct: 0, peakTime: null } }));
    expect(c?.status).toBe('n/a');
    expect(c?.reason).toMatch(/does not overshoot/);
  });

  it('fails every check of an unstable model with the reason', () => {
    const checks = buildChecks(
      inputs({ maxOvershootPct: 10, minDampingRatio: 0.5 }, { stable: false, stabilityReason: 'a pole at 0.5 + j0 lies in the right half-plane', metrics: null, estimate: null }),
    );
    expect(checks.map((c) => c.status)).toEqual(['fail', 'fail']);
    for (const c of checks) {
      expect(c.value).toBeNull();
      expect(c.reason).toMatch(/not stable: a pole at 0.5/);
    }
  });

  it('fails the metric checks when there are no exact metrics, saying why', () => {
    const [c] = buildChecks(inputs({ maxSettlingTime: 1 }, { metrics: null, metricsReason: 'the final value is zero' }));
    expect(c?.status).toBe('fail');
    expect(c?.reason).toMatch(/final value is zero/);
  });

  it('fails a limit just outside and passes one exactly on it', () => {
    expect(buildChecks(inputs({ maxSettlingTime: 1.0999 }))[0]?.status).toBe('fail');
    expect(buildChecks(inputs({ maxSettlingTime: 1.1 }))[0]?.status).toBe('pass');
  });
});
