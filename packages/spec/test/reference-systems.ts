// The spread of systems compared against the odex reference (DC gain 1
// unless named otherwise).
import type { Complex } from '../src/types.js';
import { pairOf, re, zpkWithDcGain } from './design-builders.js';

export const systems: [string, { poles: Complex[]; zeros: Complex[]; gain: number }][] = [
  ['pair -2±3j with a real pole at 10x', zpkWithDcGain([...pairOf(-2, 3), re(-20)])],
  ['pair -2±3j with a real pole at 5x', zpkWithDcGain([...pairOf(-2, 3), re(-10)])],
  ['pair -2±3j with a real pole at 2x', zpkWithDcGain([...pairOf(-2, 3), re(-4)])],
  ['zero near the pair (-3)', zpkWithDcGain([...pairOf(-2, 3), re(-15)], [re(-3)])],
  ['zero far from the pair (-30)', zpkWithDcGain([...pairOf(-2, 3), re(-15)], [re(-30)])],
  ['right-half-plane zero at +3', zpkWithDcGain([...pairOf(-2, 3), re(-15)], [re(3)])],
  ['two complex pairs', zpkWithDcGain([...pairOf(-1, 4), ...pairOf(-1.5, 6)])],
  ['sixth order with a zero', zpkWithDcGain([...pairOf(-1, 2), ...pairOf(-3, 5), re(-8), re(-12)], [re(-6)])],
  ['double real pole', zpkWithDcGain([re(-2), re(-2), re(-9)])],
  ['triple real pole with a pair', zpkWithDcGain([re(-3), re(-3), re(-3), ...pairOf(-1, 2)])],
  ['double complex pair', zpkWithDcGain([...pairOf(-1, 3), ...pairOf(-1, 3)])],
  ['biproper with complex zeros', zpkWithDcGain([...pairOf(-2, 3), re(-5)], [...pairOf(-1, 1), re(-4)])],
  ['negative DC gain', zpkWithDcGain([...pairOf(-2, 3), re(-15)], [], -2.5)],
  ['near pole-zero cancellation', zpkWithDcGain([re(-1), ...pairOf(-2, 3)], [re(-1.0005)])],
];

