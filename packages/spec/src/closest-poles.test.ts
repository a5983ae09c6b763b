import { describe, expect, it } from 'vitest';
import { closestPoles } from './closest-poles.js';

describe('closestPoles', () => {
  it('finds the pair with the smallest distance relative to the larger magnitude', () => {
    const r = closestPoles([
      { re: -1, im: 0 },
      { re: -10, im: 0 },
      { re: -10.01, im: 0 },
      { re: -1.1, im: 0 },
    ]);
    expect(r?.a.re).toBe(-10);
    expect(r?.b.re).toBe(-10.01);
    expect(r?.relative).toBeCloseTo(0.01 / 10.01, 12);
  });

  it('has no answer for fewer than two poles', () => {
    expect(closestPoles([{ re: -1, im: 0 }])).toBeNull();
    expect(closestPoles([])).toBeNull();
  });
});
