import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { assertClose } from '../test/asserts.js';
import { overshootFromDamping } from './overshoot-from-damping.js';
import { standardStepResponse } from './standard-step-response.js';

// %OS = 100 exp(-zeta pi / sqrt(1 - zeta^2)): N. S. Nise, Control Systems
// Engineering, ch. 4; K. Ogata, Modern Control Engineering, ch. 5.
describe('overshootFromDamping', () => {
  const table: [zeta: number, overshootPct: number, source: string][] = [
    [0.5, 16.3, 'Ogata ch. 5, from memory'],
    [0.7, 4.6, 'Ogata ch. 5, from memory'],
    [0.75, 2.838, 'Nise ch. 4 worked example, from memory'],
    [0.591, 10.0, 'Nise ch. 4, from memory'],
  ];
  for (const [zeta, os, source] of table) {
    it(`overshootFromDamping(${zeta}) ≈ ${os} % (${source})`, () => {
      assertClose(overshootFromDamping(zeta), os, 5e-3);
    });
  }

  it('is 100 % undamped and 0 % from critical damping on (Ogata ch. 5)', () => {
    assertClose(overshootFromDamping(0), 100, 1e-15);
    expect(overshootFromDamping(1)).toBe(0);
    expect(overshootFromDamping(2.5)).toBe(0);
  });

  it('equals the peak of the analytic step response at t = pi / omega_d (Ogata ch. 5, property test)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 0.99, noNaN: true }), (zeta) => {
        const tp = Math.PI / Math.sqrt(1 - zeta * zeta);
        const peak = standardStepResponse(zeta, tp).y;
        assertClose(overshootFromDamping(zeta), (peak - 1) * 100, 1e-9, 1e-2);
      }),
    );
  });
});
