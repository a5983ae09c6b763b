import { describe, expect, it } from 'vitest';
import fc from 'fast-check';

import { evalPhases, evalResponse } from './eval-response.js';
import { PACKED_LEVELS, packResponse } from './pack-response.js';
import { parseDesign } from './parse-design.js';
import { partialFractions } from './partial-fractions.js';
import { advancePhases, multiplyPhases, newTermPhases, phasesAt } from './term-phases.js';

// Derived phases rest on e^{z (t + h)} = e^{z t} e^{z h} (the exponential's
// addition law) and on the Taylor polynomial of e^z with Lagrange's bound on
// its remainder, |z|^7 / 7! for degree 6 (any calculus text, e.g. Apostol,
// Calculus I, sec. 7.5). The checks compare them with a direct evaluation.

const pole = fc.record({
  sigma: fc.double({ min: 0.05, max: 200, noNaN: true }),
  omega: fc.double({ min: 0, max: 300, noNaN: true }),
});

function packed(poles: { sigma: number; omega: number }[]) {
  const list = poles.flatMap(({ sigma, omega }) =>
    omega > 1e-3 ? [{ re: -sigma, im: omega }, { re: -sigma, im: -omega }] : [{ re: -sigma, im: 0 }],
  );
  let gain = 1;
  for (const p of list) gain *= Math.hypot(p.re, p.im);
  return packResponse(partialFractions(parseDesign({ poles: list, gain })), 1);
}

// The response and its first two derivatives at t, directly and from
// phases: the largest difference, relative to the size of the terms summed
// at that level (the scale of the round-off of either way).
function agree(p: ReturnType<typeof packed>, ph: ReturnType<typeof newTermPhases>, t: number): number {
  const direct = new Float64Array(3);
  const derived = new Float64Array(3);
  evalResponse(p, t, 3, direct);
  evalPhases(p, ph, 3, derived);
  let worst = 0;
  for (let l = 0; l < 3; l++) {
    let scale = 1;
    for (let k = 0; k < p.count; k++) {
      const i = 2 * PACKED_LEVELS * (p.offset[k] as number) + 2 * l * (p.degree[k] as number);
      scale += (Math.abs(p.flat[i] as number) + Math.abs(p.flat[i + 1] as number)) * Math.exp((p.sigma[k] as number) * t);
    }
    worst = Math.max(worst, Math.abs((derived[l] as number) - (direct[l] as number)) / scale);
  }
  return worst;
}

describe('term phases', () => {
  it('a chain of equal steps by multiplication matches direct evaluation to 1e-13 of the terms', () => {
    fc.assert(
      fc.property(fc.array(pole, { minLength: 1, maxLength: 4 }), fc.double({ min: 1e-3, max: 1, noNaN: true }), (poles, fraction) => {
        const p = packed(poles);
        const h = fraction / p.maxSpeed;
        const now = newTermPhases();
        const next = newTermPhases();
        const step = newTermPhases();
        phasesAt(p, 0, now);
        phasesAt(p, h, step);
        let cur = now;
        let other = next;
        for (let k = 1; k <= 40; k++) {
          multiplyPhases(p, cur, step, other, k * h);
          [cur, other] = [other, cur];
          expect(cur.chain).toBeLessThanOrEqual(p.chainLimit);
          expect(agree(p, cur, k * h)).toBeLessThan(1e-13);
        }
      }),
      { numRuns: 200 },
    );
  });

  it('short steps by the Taylor polynomial, long ones directly, both match direct evaluation', () => {
    fc.assert(
      fc.property(
        fc.array(pole, { minLength: 1, maxLength: 4 }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        fc.array(fc.double({ min: -0.05, max: 0.05, noNaN: true }), { minLength: 1, maxLength: 20 }),
        (poles, start, moves) => {
          const p = packed(poles);
          const ph = newTermPhases();
          let t = start / p.maxSpeed;
          phasesAt(p, t, ph);
          for (const move of moves) {
            t = Math.max(0, t + move / p.maxSpeed);
            advancePhases(p, ph, t, ph);
            expect(ph.t).toBe(t);
            expect(agree(p, ph, t)).toBeLessThan(1e-13);
          }
        },
      ),
      { numRuns: 200 },
    );
  });

  it('phases of another response are never used: the next step is computed directly', () => {
    const a = packed([{ sigma: 1, omega: 2 }]);
    const b = packed([{ sigma: 3, omega: 0 }]);
    const ph = newTermPhases();
    phasesAt(a, 0.5, ph);
    advancePhases(b, ph, 0.5001, ph);
    expect(ph.chain).toBe(0);
    expect(agree(b, ph, 0.5001)).toBe(0);
  });

  it('a repeated pole, whose t^n terms grow, always takes the direct way', () => {
    const p = packResponse(partialFractions(parseDesign({ poles: [{ re: -2, im: 0 }, { re: -2, im: 0 }], gain: 4 })), 1);
    expect(p.chainLimit).toBe(0);
  });
});
