import fc from 'fast-check';
import { describe, it } from 'vitest';
import { assertClose } from '../test/asserts.js';
import { riseTimeNormalized } from './rise-time-normalized.js';
import { riseTimeNormalizedFast } from './rise-time-normalized-fast.js';

describe('riseTimeNormalizedFast', () => {
  it('matches the exact root finder to 1e-6 relative on zeta in [0, 4] (property test)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 4, noNaN: true }), (zeta) => {
        assertClose(riseTimeNormalizedFast(zeta), riseTimeNormalized(zeta), 1e-6);
      }),
      { numRuns: 2000 },
    );
  }, 120_000);

  it('matches the exact root finder at the table nodes and the midpoints between them', () => {
    for (let k = 0; k <= 600; k++) {
      const zeta = k * 0.005;
      assertClose(riseTimeNormalizedFast(zeta), riseTimeNormalized(zeta), 1e-6);
    }
  });
});
