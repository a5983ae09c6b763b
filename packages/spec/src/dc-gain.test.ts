import { describe, expect, it } from 'vitest';
import { dcGain } from './dc-gain.js';
import { parseDesign } from './parse-design.js';
import { assertClose } from '../test/asserts.js';
import { pairOf, re } from '../test/design-builders.js';

describe('dcGain', () => {
  it('equals num(0)/den(0) of the polynomial form (final value theorem, Nise ch. 4)', () => {
    const m = parseDesign({ poles: [...pairOf(-2, 3), re(-15)], zeros: [re(-4)], gain: 7 });
    assertClose(dcGain(m), (m.numerator.at(-1) as number) / (m.denominator.at(-1) as number), 1e-14);
  });
  it('is null with a pole at the origin and 0 with a zero there', () => {
    expect(dcGain(parseDesign({ poles: [re(0), re(-1)], gain: 1 }))).toBeNull();
    expect(dcGain(parseDesign({ poles: [re(-1)], zeros: [re(0)], gain: 1 }))).toBe(0);
  });
  it('does not overflow on a long product (100 poles at -1000, gain 1e300)', () => {
    const m = parseDesign({ poles: Array.from({ length: 100 }, () => re(-1000)), gain: 1e300 });
    assertClose(dcGain(m), 1, 1e-12);
  });
});
