import { describe, expect, it } from 'vitest';
import { stability } from './is-stable.js';
import { parseDesign } from './parse-design.js';
import { pairOf, re } from '../test/design-builders.js';

// Source: a fact of the trade (every text on linear systems, e.g. Nise ch. 6, from memory): a continuous-time
// model is stable when every pole has a negative real part, marginal with poles on the imaginary axis.
describe('stability', () => {
  it.each([
    ['stable', [...pairOf(-1, 2), re(-3)], true, null],
    ['right half-plane real', [re(0.5), re(-1)], false, 'the pole at +0.5 is in the right half-plane, so the response grows without bound'],
    ['right half-plane pair', [...pairOf(1, 2)], false, 'the poles at +1 ± 2j are in the right half-plane, so the response grows without bound'],
    ['integrator', [re(0), re(-1)], false, 'the pole at 0 makes the response ramp without settling'],
    ['imaginary pair', [...pairOf(0, 5)], false, 'the poles at ±5j make the response oscillate without settling'],
    ['repeated imaginary pair', [...pairOf(0, 5), ...pairOf(0, 5)], false, 'the repeated poles at ±5j make the response grow without bound'],
    ['a pole at 1e-12 next to -1 counts as at the origin', [re(-1e-12), re(-1)], false, 'the pole at 0 makes the response ramp without settling'],
  ])('%s', (_name, poles, stable, reason) => {
    expect(stability(parseDesign({ poles, gain: 1 }))).toEqual({ stable, reason });
  });

  it('polynomial input with an exact integrator', () => {
    expect(stability(parseDesign({ numerator: [1], denominator: [1, 2, 0] })).stable).toBe(false);
  });
});
