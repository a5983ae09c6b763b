import { describe, expect, it } from 'vitest';

import { axisTicks, formatTick } from './axis-ticks.js';

// Ticks are "round numbers": 1, 2 or 5 times a power of ten, every tick an
// integer multiple of the step (common practice, no source; the same rule as
// d3-array's ticks).
function isRoundStep(step: number): boolean {
  const power = 10 ** Math.floor(Math.log10(step) + 1e-9);
  const m = step / power;
  return [1, 2, 5, 10].some((k) => Math.abs(m - k) < 1e-9);
}

describe('axisTicks(min, max, count)', () => {
  it.each([
    // min     max     count
    [-23.7, 4.1, 6],
    [0, 1.234, 5],
    [-0.031, 0.017, 4],
    [0, 17000, 7],
    [-8.25, 8.25, 8],
    [0.3, 0.7, 10],
  ])('axisTicks(%s, %s, %s) gives round ticks inside the range, integer times the step', (min, max, count) => {
    const { step, values } = axisTicks(min, max, count);
    expect(isRoundStep(step)).toBe(true);
    expect(values.length).toBeGreaterThanOrEqual(2);
    for (const v of values) {
      expect(v).toBeGreaterThanOrEqual(min - 1e-12);
      expect(v).toBeLessThanOrEqual(max + 1e-12);
      expect(Math.abs(v / step - Math.round(v / step))).toBeLessThan(1e-9);
    }
    // Exactly representable as the decimal the label shows (no 0.30000000000000004).
    for (const v of values) expect(String(v).length).toBeLessThan(12);
  });

  it('axisTicks(0, 1, 5) steps by 0.2 and starts at 0', () => {
    expect(axisTicks(0, 1, 5).values).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
  });

  it('axisTicks returns no ticks for an empty or broken range', () => {
    expect(axisTicks(1, 1, 5).values).toEqual([]);
    expect(axisTicks(Number.NaN, 1, 5).values).toEqual([]);
    expect(axisTicks(0, 1, 0).values).toEqual([]);
  });

  it('formatTick writes the step’s decimals and never "-0"', () => {
    expect(formatTick(0.5, 1)).toBe('0.5');
    expect(formatTick(-0, 1)).toBe('0.0');
    expect(formatTick(-0.00001, 2)).toBe('0.00');
    expect(formatTick(-20, 0)).toBe('-20');
  });
});
