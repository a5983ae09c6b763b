// Seeded random stable models of order 2 to 8 against odex 2.0.4 (the ODEX
// extrapolation integrator from the npm registry, on the controllable
// canonical realisation, test/ode-reference.ts): real poles and pairs over
// about 1.5 decades, a near copy of a pole a quarter of the time (1e-12 to
// 5e-2 apart, so clusters of every width), up to two zeros of which a fifth
// in the right half-plane. Each model is checked as poles, zeros and gain,
// and as polynomial coefficients. The reference samples 60,000 points up to
// past the settling time and the peak, refined as in ode-reference.ts.
import { describe, expect, it } from 'vitest';
import { computeStepMetrics } from './step-metrics.js';
import { parseDesign } from './parse-design.js';
import type { Complex, Model } from './types.js';
import { referenceMetrics } from '../test/ode-reference.js';
import { seededRandom } from '../test/seeded-random.js';

function randomDesign(rand: () => number): { poles: Complex[]; zeros: Complex[]; gain: number } {
  const poles: Complex[] = [];
  const order = 2 + Math.floor(rand() * 7);
  while (poles.length < order) {
    const mag = Math.exp(rand() * 3 - 0.5);
    if (rand() < 0.5 && poles.length + 2 <= order) {
      const zeta = 0.05 + rand() * 0.9;
      const wd = mag * Math.sqrt(1 - zeta * zeta);
      poles.push({ re: -zeta * mag, im: wd }, { re: -zeta * mag, im: -wd });
    } else poles.push({ re: -mag, im: 0 });
    if (rand() < 0.25 && poles.length < order) {
      const p = poles[poles.length - 1] as Complex;
      const d = Math.exp(-(3 + rand() * 9));
      if (p.im === 0) poles.push({ re: p.re * (1 + d), im: 0 });
      else if (poles.length + 2 <= order) poles.push({ re: p.re * (1 + d), im: p.im * (1 - d) }, { re: p.re * (1 + d), im: -p.im * (1 - d) });
    }
  }
  const zeros: Complex[] = [];
  const count = Math.floor(rand() * Math.min(3, order + 1));
  for (let i = 0; i < count; i++) zeros.push({ re: (rand() < 0.2 ? 1 : -1) * Math.exp(rand() * 3 - 0.5), im: 0 });
  let gain = 1;
  for (const p of poles) gain *= Math.hypot(p.re, p.im);
  for (const z of zeros) gain /= Math.abs(z.re);
  return { poles, zeros, gain };
}

function expectMatchesOdex(model: Model): void {
  const r = computeStepMetrics(model, 2);
  expect(r.metrics, r.notes.join('; ')).not.toBeNull();
  const m = r.metrics as NonNullable<typeof r.metrics>;
  const samples = 60000;
  const tEnd = Math.max(1.3 * m.settlingTime + 1, 1.5 * (m.peakTime ?? 0));
  const ref = referenceMetrics(model.numerator, model.denominator, m.finalValue, 2, tEnd, samples);
  // within 1e-4, or within two samples of the reference's grid where that is coarser
  const near = (a: number, b: number) => Math.abs(a - b) <= Math.max(1e-4 * Math.abs(b), (2 * tEnd) / samples);
  expect(Math.abs(m.overshootPct - ref.overshootPct)).toBeLessThan(1e-3);
  expect(Math.abs(m.undershootPct - ref.undershootPct)).toBeLessThan(1e-3);
  expect(near(m.settlingTime, ref.settlingTime)).toBe(true);
  expect(near(m.riseTime ?? Number.NaN, ref.riseTime)).toBe(true);
}

describe('random stable models against odex', () => {
  const rand = seededRandom(20261203);
  const designs = Array.from({ length: 40 }, () => randomDesign(rand));
  it.each(designs.map((d, i) => [i, d] as const))('model %i as poles, zeros and gain', (_i, design) => {
    expectMatchesOdex(parseDesign(design));
  });
  it.each(designs.map((d, i) => [i, d] as const))('model %i as polynomial coefficients', (_i, design) => {
    const zpk = parseDesign(design);
    expectMatchesOdex(parseDesign({ numerator: zpk.numerator, denominator: zpk.denominator }));
  });
});
