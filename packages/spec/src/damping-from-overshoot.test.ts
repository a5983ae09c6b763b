import fc from 'fast-check';
import { describe, it } from 'vitest';
import { assertClose } from '../test/asserts.js';
import { dampingFromOvershoot } from './damping-from-overshoot.js';
import { overshootFromDamping } from './overshoot-from-damping.js';

// zeta = -ln(OS/100) / sqrt(pi^2 + ln^2(OS/100)): N. S. Nise, Control Systems
// Engineering, ch. 4; K. Ogata, Modern Control Engineering, ch. 5.
describe('dampingFromOvershoot', () => {
  const table: [overshootPct: number, zeta: number, source: string][] = [
    [10, 0.591, 'Nise ch. 4, from memory'],
    [5, 0.69, 'Nise ch. 4, from memory'],
    [20, 0.456, 'Nise ch. 4, from memory'],
    [16.3, 0.5, 'Ogata ch. 5, from memory'],
  ];
  for (const [os, zeta, source] of table) {
    it(`dampingFromOvershoot(${os}) ≈ ${zeta} (${source})`, () => {
      assertClose(dampingFromOvershoot(os), zeta, 2e-3);
    });
  }

  it('dampingFromOvershoot(10) equals the closed form -ln(0.1)/sqrt(pi^2 + ln^2 0.1) (Nise ch. 4)', () => {
    const l = Math.log(0.1);
    assertClose(dampingFromOvershoot(10), -l / Math.sqrt(Math.PI ** 2 + l * l), 1e-15);
  });

  it('is the inverse of overshootFromDamping on (0, 100) (exact relation, property test)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 99.999, noNaN: true }), (os) => {
        assertClose(overshootFromDamping(dampingFromOvershoot(os)), os, 1e-10);
      }),
    );
  });

  it('falls from 1 to 0 as the overshoot grows (exact relation, property test)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 99.9, noNaN: true }), fc.double({ min: 1e-3, max: 0.09, noNaN: true }), (os, d) => {
        const z = dampingFromOvershoot(os);
        return z > 0 && z < 1 && dampingFromOvershoot(os + d) < z;
      }),
    );
  });

  it('gives NaN outside (0, 100): no damping ratio overshoots by 0 or 100 % or more', () => {
    for (const os of [0, 100, 150, -5, Number.NaN]) {
      if (!Number.isNaN(dampingFromOvershoot(os))) throw new Error(`expected NaN for ${os}`);
    }
  });
});
