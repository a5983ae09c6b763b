import { describe, expect, it } from 'vitest';
import { assertClose } from '../test/asserts.js';
import { dampingFromOvershoot } from './damping-from-overshoot.js';
import { regionBounds } from './region-bounds.js';
import { riseTimeNormalized } from './rise-time-normalized.js';

const contractExample = {
  maxOvershootPct: 10,
  maxSettlingTime: 1.2,
  settlingBandPct: 2,
  maxPeakTime: 0.6,
  maxRiseTime: 0.3,
  minDampingRatio: 0.6,
  maxNaturalFrequency: 80,
  dominanceRatio: 5,
  marginPct: 0,
};

describe('regionBounds', () => {
  it('takes the larger of the damping floor and zeta(10 %) ≈ 0.591 (Nise ch. 4): 0.6 from the floor', () => {
    const b = regionBounds(contractExample);
    assertClose(b.minDampingRatio, 0.6, 1e-15);
    expect(b.dampingFrom).toBe('minDampingRatio');
  });

  it('uses zeta(OS) when the overshoot limit is the stricter one (Nise ch. 4; Ogata ch. 5)', () => {
    const b = regionBounds({ maxOvershootPct: 5, minDampingRatio: 0.6 });
    assertClose(b.minDampingRatio, 0.69, 2e-3);
    expect(b.dampingFrom).toBe('maxOvershootPct');
  });

  it('puts the decay line at 4 / Ts for a 2 % band and 3 / Ts for 5 % (Ogata ch. 5; Nise ch. 4)', () => {
    assertClose(regionBounds(contractExample).minDecayRate, 4 / 1.2, 1e-15);
    assertClose(regionBounds({ maxSettlingTime: 1.2, settlingBandPct: 5 }).minDecayRate, 3 / 1.2, 1e-15);
    assertClose(regionBounds({ maxSettlingTime: 2, settlingBandPct: 1 }).settlingConstant, 4.6, 2e-3);
  });

  it('puts the damped-frequency lines at pi / Tp (Nise ch. 4; Ogata ch. 5)', () => {
    assertClose(regionBounds(contractExample).minDampedFrequency, Math.PI / 0.6, 1e-15);
  });

  it('samples the rise-time curve omega_n >= f(zeta) / Tr from the damping floor to zeta = 1', () => {
    const b = regionBounds(contractExample);
    const first = b.riseTimeCurve[0];
    const last = b.riseTimeCurve[b.riseTimeCurve.length - 1];
    assertClose(first?.dampingRatio, 0.6, 1e-15);
    assertClose(last?.dampingRatio, 1, 1e-12);
    b.riseTimeCurve.forEach((p, i) => {
      if (i > 0) expect(p.dampingRatio).toBeGreaterThan((b.riseTimeCurve[i - 1]?.dampingRatio ?? 0) + 1e-6);
    });
    for (const p of b.riseTimeCurve) assertClose(p.minNaturalFrequency, riseTimeNormalized(p.dampingRatio) / 0.3, 1e-6);
    // Dorf & Bishop, Modern Control Systems, ch. 5: omega_n Tr ≈ 2.16 zeta + 0.60 (loose)
    const at06 = b.riseTimeCurve.find((p) => Math.abs(p.dampingRatio - 0.6) < 1e-12);
    assertClose((at06?.minNaturalFrequency ?? 0) * 0.3, 2.16 * 0.6 + 0.6, 0.08);
  });

  it('has no rise-time curve, decay rate or ceiling without those limits, and reports the dominance ratio', () => {
    const b = regionBounds({ maxOvershootPct: 10, dominanceRatio: 10 });
    expect(b.riseTimeCurve).toEqual([]);
    expect(b.minDecayRate).toBeNull();
    expect(b.settlingConstant).toBeNull();
    expect(b.maxNaturalFrequency).toBeNull();
    expect(b.minDampedFrequency).toBeNull();
    expect(b.dominanceRatio).toBe(10);
    expect(b.feasible).toBe(true);
  });

  it('draws the region for the limits tightened by marginPct and says so', () => {
    const b = regionBounds({ ...contractExample, marginPct: 10 });
    expect(b.marginApplied).toBe(true);
    assertClose(b.minDecayRate, 4 / (1.2 * 0.9), 1e-14);
    assertClose(b.minDampedFrequency, Math.PI / (0.6 * 0.9), 1e-14);
    assertClose(b.maxRiseTime, 0.27, 1e-14);
    assertClose(b.maxNaturalFrequency, 72, 1e-14);
    // zeta from 9 % overshoot (0.608) against the floor 0.66: the floor wins
    assertClose(b.minDampingRatio, 0.66, 1e-14);
    assertClose(dampingFromOvershoot(9), 0.608, 2e-3);
    expect(b.requestedLimits.maxOvershootPct).toBe(10);
    assertClose(b.limits.maxOvershootPct, 9, 1e-14);
  });

  it('says the region is empty when the ceiling is below the decay line', () => {
    // sigma >= 4 / 0.1 = 40 cannot hold with omega_n <= 20 since sigma <= omega_n.
    expect(regionBounds({ maxSettlingTime: 0.1, maxNaturalFrequency: 20 }).feasible).toBe(false);
    expect(regionBounds({ maxSettlingTime: 0.1, maxNaturalFrequency: 41 }).feasible).toBe(true);
  });

  it('says the region is empty for a damping floor of 1 with a peak-time limit (no oscillation, no peak)', () => {
    expect(regionBounds({ minDampingRatio: 1, maxPeakTime: 1 }).feasible).toBe(false);
    expect(regionBounds({ minDampingRatio: 1, maxSettlingTime: 1 }).feasible).toBe(true);
  });
});
