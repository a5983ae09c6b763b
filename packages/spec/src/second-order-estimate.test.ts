import { describe, expect, it } from 'vitest';
import { assertClose } from '../test/asserts.js';
import { secondOrderEstimate } from './second-order-estimate.js';
import type { Complex, Dominance } from './types.js';

function dominance(poles: Complex[]): Dominance {
  const p = poles[0] as Complex;
  const wn = Math.hypot(p.re, p.im);
  return { poles, dampingRatio: -p.re / wn, naturalFrequency: wn, ratio: null, zeroRatio: null, approximationValid: true, notes: [] };
}

describe('secondOrderEstimate', () => {
  // T(s) = 100 / (s^2 + 15 s + 100): omega_n = 10, zeta = 0.75, poles -7.5 +/- j 6.614.
  const wd = Math.sqrt(100 - 7.5 * 7.5);
  const pair = dominance([
    { re: -7.5, im: wd },
    { re: -7.5, im: -wd },
  ]);
  const e = secondOrderEstimate(pair, 2);

  it('gives Tp ≈ 0.475 s for 100 / (s^2 + 15 s + 100) (Nise, Control Systems Engineering, ch. 4 worked example, from memory)', () => {
    assertClose(e.peakTime, 0.475, 2e-3);
  });
  it('gives %OS ≈ 2.838 for the same system (Nise ch. 4 worked example, from memory)', () => {
    assertClose(e.overshootPct, 2.838, 1e-3);
  });
  it('gives Ts ≈ 0.533 s by the 4 / sigma rule (Nise ch. 4 worked example, from memory)', () => {
    assertClose(e.settlingTime, 0.533, 1e-3);
  });
  it('gives Tr ≈ 0.23 s (Nise ch. 4 worked example, from memory)', () => {
    assertClose(e.riseTime, 0.23, 0.02);
  });
  it('uses 3 / sigma for a 5 % band (Ogata, Modern Control Engineering, ch. 5)', () => {
    assertClose(secondOrderEstimate(pair, 5).settlingTime, 3 / 7.5, 1e-15);
  });

  it('uses the first-order formulas for a real dominant pole: 1 - e^{-2t} reaches 98 % at ln(50)/2 and rises 10-90 % in ln(9)/2 (exact relations)', () => {
    const real = secondOrderEstimate(dominance([{ re: -2, im: 0 }]), 2);
    expect(real.overshootPct).toBe(0);
    expect(real.peakTime).toBeNull();
    assertClose(1 - Math.exp(-2 * (real.settlingTime ?? 0)), 0.98, 1e-12);
    const t10 = -Math.log(0.9) / 2;
    const t90 = -Math.log(0.1) / 2;
    assertClose(real.riseTime, t90 - t10, 1e-12);
  });

  it('gives no estimate for a dominant pole that does not decay, or none at all', () => {
    const none = { overshootPct: null, peakTime: null, settlingTime: null, riseTime: null };
    expect(secondOrderEstimate(dominance([{ re: 0, im: 3 }, { re: 0, im: -3 }]), 2)).toEqual(none);
    expect(secondOrderEstimate(dominance([{ re: 1, im: 0 }]), 2)).toEqual(none);
    expect(secondOrderEstimate({ ...pair, poles: [] }, 2)).toEqual(none);
  });
});
