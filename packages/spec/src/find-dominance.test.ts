import { describe, expect, it } from 'vitest';
import { findDominance } from './find-dominance.js';
import { parseDesign } from './parse-design.js';
import { assertClose } from '../test/asserts.js';
import { pairOf, re, zpkWithDcGain } from '../test/design-builders.js';

const dominance = (poles: ReturnType<typeof re>[], zeros: ReturnType<typeof re>[] = [], ratio = 5) =>
  findDominance(parseDesign(zpkWithDcGain(poles, zeros)), ratio);

describe('findDominance', () => {
  it('pair -2 ± 3j with a pole at -20: zeta = 2/sqrt(13), wn = sqrt(13), ratio 10 (zeta = sigma/wn, Nise ch. 4)', () => {
    const d = dominance([...pairOf(-2, 3), re(-20)]);
    expect(d.poles).toEqual(pairOf(-2, 3));
    assertClose(d.dampingRatio, 2 / Math.sqrt(13), 1e-15);
    assertClose(d.naturalFrequency, Math.sqrt(13), 1e-15);
    assertClose(d.ratio, 10, 1e-15);
    expect(d.zeroRatio).toBeNull();
    expect(d.approximationValid).toBe(true);
    expect(d.notes).toEqual([]);
  });

  it('a real pole only 2x farther left: not valid, the note names the pole and the ratio', () => {
    const d = dominance([...pairOf(-2, 3), re(-4)]);
    assertClose(d.ratio, 2, 1e-15);
    expect(d.approximationValid).toBe(false);
    expect(d.notes).toContain('the real pole at -4 is only 2.0x farther left than the dominant pair (5x needed)');
  });

  it('the dominance ratio is the caller\'s (3x: rough sizing, common practice, no source)', () => {
    expect(dominance([...pairOf(-2, 3), re(-7)], [], 3).approximationValid).toBe(true);
    expect(dominance([...pairOf(-2, 3), re(-7)], [], 5).approximationValid).toBe(false);
  });

  it('a second pair too close is named as a pair', () => {
    const d = dominance([...pairOf(-1, 2), ...pairOf(-3, 4)]);
    expect(d.notes).toContain('the poles at -3 ± 4j are only 3.0x farther left than the dominant pair (5x needed)');
  });

  it('a right-half-plane zero makes the approximation invalid with a note', () => {
    const d = dominance([...pairOf(-2, 3), re(-30)], [re(3)]);
    expect(d.approximationValid).toBe(false);
    expect(d.notes).toContain('the zero at +3 is in the right half-plane: expect undershoot');
    assertClose(d.zeroRatio, 1.5, 1e-15);
  });

  it('a zero near the pair: zeroRatio below the threshold, noted', () => {
    const d = dominance([...pairOf(-2, 3), re(-30)], [re(-3)]);
    assertClose(d.zeroRatio, 1.5, 1e-15);
    expect(d.approximationValid).toBe(false);
    expect(d.notes).toContain('the zero at -3 is only 1.5x farther left than the dominant pair (5x needed)');
  });

  it('a near pole-zero cancellation (within 1 %) is left out of both ratios, and the slow cancelled pole is not dominant', () => {
    const d = dominance([re(-1), ...pairOf(-2, 3), re(-25)], [re(-1.005)]);
    expect(d.poles).toEqual(pairOf(-2, 3));
    assertClose(d.ratio, 12.5, 1e-15);
    expect(d.zeroRatio).toBeNull();
    expect(d.approximationValid).toBe(true);
    expect(d.notes.join(' ')).toMatch(/zero at -1.005 nearly cancels the pole at -1/);
  });

  it('a real dominant pole: first order, damping ratio null, natural frequency |p|', () => {
    const d = dominance([re(-1), ...pairOf(-10, 10)]);
    expect(d.poles).toEqual([re(-1)]);
    expect(d.dampingRatio).toBeNull();
    expect(d.naturalFrequency).toBe(1);
    assertClose(d.ratio, 10, 1e-15);
  });

  it('an unstable model: the rightmost pole, said so, never valid', () => {
    const d = findDominance(parseDesign({ poles: [re(0.5), ...pairOf(-2, 3)], gain: 1 }), 5);
    expect(d.poles).toEqual([re(0.5)]);
    expect(d.approximationValid).toBe(false);
    expect(d.notes.join(' ')).toMatch(/not stable: the rightmost pole at \+0.5 is taken as dominant/);
  });

  it('a model without poles has no dominant pole', () => {
    const d = findDominance(parseDesign({ numerator: [2], denominator: [1] }), 5);
    expect(d.poles).toEqual([]);
    expect(d.approximationValid).toBe(false);
  });
});
