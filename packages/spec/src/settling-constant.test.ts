import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { assertClose } from '../test/asserts.js';
import { settlingConstant } from './settling-constant.js';

describe('settlingConstant', () => {
  it('is 4 for a 2 % band (Ogata, Modern Control Engineering, ch. 5; Nise, Control Systems Engineering, ch. 4)', () => {
    expect(settlingConstant(2)).toBe(4);
  });
  it('is 3 for a 5 % band (Ogata ch. 5; Nise ch. 4)', () => {
    expect(settlingConstant(5)).toBe(3);
  });
  it('is about 4.6 for a 1 % band (Franklin, Powell, Emami-Naeini, Feedback Control of Dynamic Systems, ch. 3)', () => {
    assertClose(settlingConstant(1), 4.6, 2e-3);
  });
  it('is the envelope value ln(100 / band) for other bands (exact relation, property test)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 20, noNaN: true }), (band) => {
        fc.pre(band !== 2 && band !== 5);
        // e^{-c} = band / 100: the envelope e^{-sigma t} reaches the band at t = c / sigma.
        assertClose(Math.exp(-settlingConstant(band)), band / 100, 1e-12);
      }),
    );
  });
});
