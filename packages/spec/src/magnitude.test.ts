import { describe, expect, it } from 'vitest';
import fc from 'fast-check';

import { magnitude } from './magnitude.js';

describe('magnitude', () => {
  // Math.hypot is the reference (ECMA-262, Math.hypot: the square root of the sum of squares, avoiding overflow and underflow).
  it('agrees with Math.hypot to 2 ulps over the whole double range', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), fc.double({ noNaN: true, noDefaultInfinity: true }), (x, y) => {
        const ref = Math.hypot(x, y);
        const got = magnitude(x, y);
        if (ref === 0 || ref === Infinity) return got === ref;
        return Math.abs(got - ref) <= 4.5e-16 * ref;
      }),
      { numRuns: 20000 },
    );
  });

  it('does not overflow or underflow where the squares would', () => {
    // 3-4-5 right triangle, scaled to the ends of the double range
    expect(magnitude(3e200, 4e200)).toBeCloseTo(5e200, -186);
    expect(magnitude(3e-200, 4e-200) / 5e-200).toBeCloseTo(1, 14);
    expect(magnitude(0, 0)).toBe(0);
    expect(magnitude(Number.NaN, 1)).toBeNaN();
    expect(magnitude(Infinity, 1)).toBe(Infinity);
  });
});
