import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { assertClose } from '../test/asserts.js';
import { parseDesign } from './parse-design.js';
import { regionSlack } from './region-slack.js';
import { computeStepMetrics } from './step-metrics.js';

// A pure second-order pair omega_n^2 / (s^2 + 2 zeta omega_n s + omega_n^2).
function pair(zeta: number, wn: number) {
  return {
    pole: { re: -zeta * wn, im: wn * Math.sqrt(1 - zeta * zeta) },
    model: parseDesign({ numerator: [wn * wn], denominator: [1, 2 * zeta * wn, wn * wn] }),
  };
}

describe('regionSlack', () => {
  it('measures each limit in its own units: contract example pole -3.66 + j4.88 against 10 %, 1.2 s, 0.7 s', () => {
    const s = regionSlack({ re: -3.66, im: 4.88 }, { maxOvershootPct: 10, maxSettlingTime: 1.2, maxPeakTime: 0.7, maxNaturalFrequency: 80 });
    const zeta = 3.66 / Math.hypot(3.66, 4.88);
    // %OS = 100 exp(-zeta pi / sqrt(1 - zeta^2)) (Nise ch. 4), Ts = 4 / sigma, Tp = pi / omega_d (Ogata ch. 5)
    assertClose(s.slack.maxOvershootPct, 10 - 100 * Math.exp((-zeta * Math.PI) / Math.sqrt(1 - zeta * zeta)), 1e-12);
    assertClose(s.slack.maxSettlingTime, 1.2 - 4 / 3.66, 1e-12);
    assertClose(s.slack.maxPeakTime, 0.7 - Math.PI / 4.88, 1e-12);
    assertClose(s.slack.maxNaturalFrequency, 80 - 6.1, 1e-12);
    expect(s.inside).toBe(true);
  });

  it('is never inside for a pole on or right of the imaginary axis', () => {
    expect(regionSlack({ re: 0, im: 2 }, { maxNaturalFrequency: 10 }).inside).toBe(false);
    expect(regionSlack({ re: 0.5, im: 0 }, { maxNaturalFrequency: 10 }).inside).toBe(false);
  });

  it('puts a real pole outside any peak-time limit (no oscillation: omega_d = 0 < pi / Tp)', () => {
    expect(regionSlack({ re: -5, im: 0 }, { maxPeakTime: 1 }).inside).toBe(false);
  });

  it('tightens the limits by marginPct as the region is drawn', () => {
    const pole = { re: -4, im: 3 }; // omega_n = 5
    expect(regionSlack(pole, { maxNaturalFrequency: 5.2 }).inside).toBe(true);
    expect(regionSlack(pole, { maxNaturalFrequency: 5.2, marginPct: 5 }).inside).toBe(false);
  });

  it('agrees with the exact step metrics of a pure second-order pair at the overshoot, peak-time and rise-time limits (property test)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 0.97, noNaN: true }),
        fc.double({ min: 0.5, max: 50, noNaN: true }),
        fc.tuple(fc.double({ min: 0.5, max: 1.5, noNaN: true }), fc.double({ min: 0.5, max: 1.5, noNaN: true }), fc.double({ min: 0.5, max: 1.5, noNaN: true })),
        fc.constantFrom(0, 5),
        (zeta, wn, [fOs, fTp, fTr], marginPct) => {
          // limits a factor away from the exact value; too close to it, round-off decides
          fc.pre([fOs, fTp, fTr].every((x) => Math.abs(x * (1 - marginPct / 100) - 1) > 1e-6));
          const { pole, model } = pair(zeta, wn);
          const m = computeStepMetrics(model, 2).metrics;
          expect(m).not.toBeNull();
          if (m === null || m.peakTime === null || m.riseTime === null) return;
          const req = {
            maxOvershootPct: Math.min(99, m.overshootPct * fOs),
            maxPeakTime: m.peakTime * fTp,
            maxRiseTime: m.riseTime * fTr,
            marginPct,
          };
          const s = regionSlack(pole, req);
          const f = 1 - marginPct / 100;
          expect((s.slack.maxOvershootPct ?? 0) >= 0).toBe(m.overshootPct <= req.maxOvershootPct * f);
          expect((s.slack.maxPeakTime ?? 0) >= 0).toBe(m.peakTime <= req.maxPeakTime * f);
          expect((s.slack.maxRiseTime ?? 0) >= 0).toBe(m.riseTime <= req.maxRiseTime * f);
          expect(s.inside).toBe(
            m.overshootPct <= req.maxOvershootPct * f && m.peakTime <= req.maxPeakTime * f && m.riseTime <= req.maxRiseTime * f,
          );
        },
      ),
      { numRuns: 500 },
    );
  }, 120_000);

  it('agrees with the exact metrics at the damping floor and the natural-frequency ceiling (exact relations)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 0.97, noNaN: true }), fc.double({ min: 0.5, max: 50, noNaN: true }), (zeta, wn) => {
        const { pole } = pair(zeta, wn);
        const s = regionSlack(pole, { minDampingRatio: zeta, maxNaturalFrequency: wn });
        assertClose(s.slack.minDampingRatio, 0, 1e-12, 1);
        assertClose(s.slack.maxNaturalFrequency, 0, 1e-12, wn);
      }),
    );
  });

  it('keeps the exact settling time of a pure pair under the envelope bound ln(100 / (band sqrt(1 - zeta^2))) / sigma (Ogata ch. 5), while the region uses 4 / sigma', () => {
    // The decay line is the textbook approximation Ts ≈ 4 / sigma, not the exact
    // settling time; the envelope e^{-sigma t} / sqrt(1 - zeta^2) bounds the exact one.
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 0.97, noNaN: true }), fc.double({ min: 0.5, max: 50, noNaN: true }), (zeta, wn) => {
        const { model } = pair(zeta, wn);
        const m = computeStepMetrics(model, 2).metrics;
        const sigma = zeta * wn;
        expect(m?.settlingTime ?? Number.POSITIVE_INFINITY).toBeLessThanOrEqual((Math.log(100 / (2 * Math.sqrt(1 - zeta * zeta))) / sigma) * (1 + 1e-9));
      }),
    );
  });
});
