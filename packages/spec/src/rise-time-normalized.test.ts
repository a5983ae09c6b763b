import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { assertClose } from '../test/asserts.js';
import { riseTimeNormalized } from './rise-time-normalized.js';
import { standardStepCrossing } from './standard-step-crossing.js';
import { standardStepResponse } from './standard-step-response.js';

describe('riseTimeNormalized (exact 10-90 % rise time times omega_n)', () => {
  const nise: [zeta: number, wnTr: number][] = [
    [0.1, 1.1],
    [0.5, 1.64],
    [0.9, 2.88],
  ];
  for (const [zeta, wnTr] of nise) {
    it(`riseTimeNormalized(${zeta}) ≈ ${wnTr} (Nise, Control Systems Engineering, ch. 4 table, from memory)`, () => {
      assertClose(riseTimeNormalized(zeta), wnTr, 1e-2);
    });
  }

  it('stays near (2.16 zeta + 0.60) over 0.3..0.8 (Dorf & Bishop, Modern Control Systems, ch. 5, an approximation)', () => {
    for (let k = 30; k <= 80; k++) {
      const zeta = k / 100;
      assertClose(riseTimeNormalized(zeta), 2.16 * zeta + 0.6, 0.08);
    }
  });

  it('is about 1.8 near zeta = 0.5 (Franklin, Powell, Emami-Naeini, Feedback Control of Dynamic Systems, ch. 3, rough)', () => {
    assertClose(riseTimeNormalized(0.5), 1.8, 0.12);
  });

  it('gives Tr ≈ 0.23 s for 100 / (s^2 + 15 s + 100) (Nise ch. 4 worked example, from memory)', () => {
    assertClose(riseTimeNormalized(0.75) / 10, 0.23, 0.02);
  });

  it('finds the 0-100 % crossing at (pi - arccos zeta) / omega_d (Ogata, Modern Control Engineering, ch. 5; property test of the root finder)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 0.9, noNaN: true }), (zeta) => {
        // Up to 0.9: nearer 1 the response creeps through 1 so slowly that the crossing is ill-conditioned.
        const wd = Math.sqrt(1 - zeta * zeta);
        assertClose(standardStepCrossing(zeta, 1), (Math.PI - Math.acos(zeta)) / wd, 1e-10);
      }),
    );
  });

  it('puts each crossing on its level: y(t_L) = L to 1e-12 (exact relation, property test)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 6, noNaN: true }), fc.double({ min: 0.01, max: 0.99, noNaN: true }), (zeta, level) => {
        const t = standardStepCrossing(zeta, level);
        assertClose(standardStepResponse(zeta, t).y, level, 1e-12);
      }),
    );
  });

  it('is continuous through critical damping (underdamped, critical and overdamped forms agree)', () => {
    const at1 = riseTimeNormalized(1);
    assertClose(riseTimeNormalized(1 - 1e-9), at1, 1e-8);
    assertClose(riseTimeNormalized(1 + 1e-9), at1, 1e-8);
  });

  it('approaches ln(9) times the slow time constant when heavily overdamped (first-order limit, exact relation)', () => {
    // The slow pole of s^2 + 2 zeta s + 1 is at -(zeta - sqrt(zeta^2 - 1)); the fast one stops mattering.
    const zeta = 200;
    const slow = zeta - Math.sqrt(zeta * zeta - 1);
    assertClose(riseTimeNormalized(zeta) * slow, Math.log(9), 1e-4);
  });

  it('is NaN for a negative damping ratio (no settled response)', () => {
    expect(riseTimeNormalized(-0.1)).toBeNaN();
  });
});
