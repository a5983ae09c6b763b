// The cluster expansion (partial-fractions.ts) against the plain modal sum,
// on random clusters 1e-3 to 5e-3 of their size wide. The plain sum is exact
// in theory but loses eps times its largest terms to round-off (1e-14 to
// 1e-6 of the final value here, by how tight the cluster is), so the two must
// agree to within that. (A high-precision check of one case where they
// differ by 1.3e-8, four real poles 1e-3 apart near -0.5, found the
// expansion right to 1e-16.) fast-check 4.11.0.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { clusteredPartialFractions, partialFractions, type ModalForm } from './partial-fractions.js';
import { packResponse } from './pack-response.js';
import { evalResponse } from './eval-response.js';
import { parseDesign } from './parse-design.js';
import type { Complex } from './types.js';
import { zpkWithDcGain } from '../test/design-builders.js';
import { modalSpread } from './conditioned-modal-form.js';

const valueOf = (form: ModalForm, t: number): number => {
  const out = new Float64Array(1);
  evalResponse(packResponse(form, 1), t, 1, out);
  return out[0] as number;
};

const cluster = fc
  .record({
    size: fc.double({ min: 0.5, max: 20, noNaN: true }),
    zeta: fc.option(fc.double({ min: 0.3, max: 0.9, noNaN: true }), { nil: undefined }),
    // members i = 0, 1, ... placed i widths along a direction, each moved by at
    // most 0.2 width: any two at least 0.6 width apart, so no pair is nearer
    jitter: fc.array(fc.double({ min: -0.2, max: 0.2, noNaN: true }), { minLength: 2, maxLength: 4 }),
    angle: fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
    width: fc.double({ min: 1e-3, max: 5e-3, noNaN: true }),
    far: fc.array(fc.double({ min: 3, max: 10, noNaN: true }), { maxLength: 2 }),
  })
  .map(({ size, zeta, jitter, angle, width, far }) => {
    const re = zeta === undefined ? -size : -zeta * size;
    const im = zeta === undefined ? 0 : size * Math.sqrt(1 - zeta * zeta);
    const [dr, di] = zeta === undefined ? [1, 0] : [Math.cos(angle), Math.sin(angle)];
    const poles: Complex[] = [];
    for (let i = 0; i < jitter.length; i++) {
      const d = (i + (jitter[i] as number)) * width * size;
      const p = { re: re + d * dr, im: im + d * di };
      poles.push(p);
      if (zeta !== undefined) poles.push({ re: p.re, im: -p.im });
    }
    for (const f of far) poles.push({ re: -f * size, im: 0 });
    return zpkWithDcGain(poles);
  });

describe('cluster expansion properties', () => {
  it('a cluster summed by expansion gives the same response as its poles kept apart', () => {
    fc.assert(
      fc.property(cluster, fc.double({ min: 0.05, max: 8, noNaN: true }), (design, tau) => {
        const model = parseDesign(design);
        const together = clusteredPartialFractions(model, 2e-2);
        expect(together).not.toBeNull();
        const apart = partialFractions(model);
        const slowest = Math.min(...model.poles.map((p) => Math.abs(p.re)));
        const t = tau / slowest;
        // DC gain 1: the plain sum's round-off is about eps times its spread
        const roundOff = 2.220446049250313e-16 * modalSpread(apart, 1);
        return Math.abs(valueOf(together as ModalForm, t) - valueOf(apart, t)) <= 1e-13 + 8 * roundOff;
      }),
      { numRuns: 300 },
    );
  }, 60_000);
});
