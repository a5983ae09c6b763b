import { describe, expect, it } from 'vitest';
import { computeStepMetrics } from './step-metrics.js';
import { parseDesign } from './parse-design.js';
import type { Model, StepMetrics } from './types.js';
import { SpecInputError } from './spec-input-error.js';
import { assertClose } from '../test/asserts.js';
import { referenceMetrics } from '../test/ode-reference.js';
import { systems } from '../test/reference-systems.js';
import { pairOf, re, zpkWithDcGain } from '../test/design-builders.js';
import { MAX_ROUNDING, modalSpread } from './conditioned-modal-form.js';
import { partialFractions } from './partial-fractions.js';

function metricsOf(design: unknown, band = 2): StepMetrics {
  const { metrics } = computeStepMetrics(parseDesign(design), band);
  expect(metrics).not.toBeNull();
  return metrics as StepMetrics;
}

const standard = (zeta: number, wn: number) => ({ numerator: [wn * wn], denominator: [1, 2 * zeta * wn, wn * wn] });

// The standard second-order unit-step response in closed form (Nise ch. 4;
// Ogata ch. 5): c(t) = 1 - e^{-zeta wn t} (cos wd t + zeta/sqrt(1-zeta^2) sin wd t).
function standardResponse(zeta: number, wn: number, t: number): number {
  const wd = wn * Math.sqrt(1 - zeta * zeta);
  return 1 - Math.exp(-zeta * wn * t) * (Math.cos(wd * t) + (zeta / Math.sqrt(1 - zeta * zeta)) * Math.sin(wd * t));
}

describe('computeStepMetrics against published second-order relations', () => {
  const zetas = [0.05, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 0.95];
  it.each(zetas)('%%OS = 100 exp(-zeta pi / sqrt(1 - zeta^2)) and Tp = pi / wd at zeta = %s (Nise ch. 4; Ogata ch. 5)', (zeta) => {
    const wn = 7;
    const m = metricsOf(standard(zeta, wn));
    assertClose(m.overshootPct, 100 * Math.exp((-zeta * Math.PI) / Math.sqrt(1 - zeta * zeta)), 1e-9);
    assertClose(m.peakTime, Math.PI / (wn * Math.sqrt(1 - zeta * zeta)), 1e-9);
    assertClose(m.finalValue, 1, 1e-12);
    expect(m.undershootPct).toBe(0);
  });

  it.each(zetas)('settling time at zeta = %s: |c(Ts) - 1| = band exactly, inside ever after; near 4/(zeta wn) (Ogata ch. 5; Nise ch. 4)', (zeta) => {
    const wn = 3;
    const m = metricsOf(standard(zeta, wn));
    assertClose(Math.abs(standardResponse(zeta, wn, m.settlingTime) - 1), 0.02, 1e-7);
    for (let k = 1; k <= 2000; k++) {
      const t = m.settlingTime * (1 + k / 200);
      expect(Math.abs(standardResponse(zeta, wn, t) - 1)).toBeLessThan(0.02);
    }
    // the 4/sigma rule is an envelope approximation: loose
    assertClose(m.settlingTime, 4 / (zeta * wn), 0.3);
  });

  it.each([0.3, 0.5, 0.7, 0.8])('rise time at zeta = %s near (2.16 zeta + 0.60)/wn (Dorf & Bishop ch. 5)', (zeta) => {
    const wn = 5;
    const m = metricsOf(standard(zeta, wn));
    assertClose(m.riseTime, (2.16 * zeta + 0.6) / wn, 0.06);
  });

  // Nise ch. 4 table of wn Tr against zeta (from memory): 1.10 at 0.1, 1.64 at 0.5, 2.88 at 0.9
  it.each([
    [0.1, 1.1],
    [0.5, 1.64],
    [0.9, 2.88],
  ])('normalized 10-90 %% rise time wn Tr at zeta = %s is about %s (Nise ch. 4, from memory)', (zeta, table) => {
    const m = metricsOf(standard(zeta, 1));
    assertClose(m.riseTime, table, 0.01);
  });

  it('worked example T = 100/(s^2 + 15 s + 100): Tp 0.475, %OS 2.838, Ts 0.533 (4/sigma), Tr 0.23 (Nise ch. 4, from memory)', () => {
    const m = metricsOf({ numerator: [100], denominator: [1, 15, 100] });
    assertClose(m.peakTime, 0.475, 0.01);
    assertClose(m.overshootPct, 2.838, 0.01);
    assertClose(m.settlingTime, 0.533, 0.15);
    assertClose(m.riseTime, 0.23, 0.05);
    // tightly against the closed forms with zeta = 0.75, wn = 10
    const zeta = 0.75;
    assertClose(m.overshootPct, 100 * Math.exp((-zeta * Math.PI) / Math.sqrt(1 - zeta * zeta)), 1e-10);
    assertClose(m.peakTime, Math.PI / (10 * Math.sqrt(1 - zeta * zeta)), 1e-10);
    assertClose(Math.abs(standardResponse(zeta, 10, m.settlingTime) - 1), 0.02, 1e-8);
  });

  it('first-order a/(s + a): Tr = ln 9 / a ~ 2.2/a and Ts = ln 50 / a ~ 4/a, no overshoot (Nise ch. 4)', () => {
    const a = 4;
    const m = metricsOf({ poles: [re(-a)], gain: a });
    assertClose(m.riseTime, Math.log(9) / a, 1e-10);
    assertClose(m.riseTime, 2.2 / a, 0.01);
    assertClose(m.settlingTime, Math.log(50) / a, 1e-10);
    assertClose(m.settlingTime, 4 / a, 0.03);
    expect(m.overshootPct).toBe(0);
    expect(m.peakTime).toBeNull();
  });

  it('bands other than 2 %: first-order Ts = ln(100/band)/a (5 %: about 3/a, Ogata ch. 5)', () => {
    for (const band of [1, 5, 10, 20]) {
      const m = metricsOf({ poles: [re(-2)], gain: 2 }, band);
      assertClose(m.settlingTime, Math.log(100 / band) / 2, 1e-10);
      expect(m.settlingBandPct).toBe(band);
    }
  });
});

// The metrics against odex on the model's polynomial realisation, sampled
// densely past the settling time and refined (test/ode-reference.ts).
function expectMatchesOdex(model: Model, m: StepMetrics): void {
  const ref = referenceMetrics(model.numerator, model.denominator, m.finalValue, 2, 1.3 * m.settlingTime + 1, 40000);
  assertClose(m.overshootPct, ref.overshootPct, 1e-5, 1e-3);
  assertClose(m.undershootPct, ref.undershootPct, 1e-5, 1e-3);
  if (ref.peakTime === null) expect(m.peakTime).toBeNull();
  else assertClose(m.peakTime, ref.peakTime, 1e-3, 1e-3);
  assertClose(m.settlingTime, ref.settlingTime, 1e-4);
  assertClose(m.riseTime, ref.riseTime, 1e-4);
}

describe('computeStepMetrics against odex (ODEX extrapolation integrator on the state-space realisation)', () => {
  it.each(systems)('%s: metrics agree with dense reference sampling plus refinement', (_name, design) => {
    const model = parseDesign(design);
    const m = metricsOf(design);
    expectMatchesOdex(model, m);
  });
});

// Poles 1e-5 to 1e-2 of their size apart: kept apart, their residues cancel
// past what double precision carries (the default form is checked to be
// that ill-conditioned), so the engine clusters them and sums each cluster by
// expansion about its mean. odex integrates the polynomial realisation, which
// has no such cancellation.
describe('nearly repeated poles against odex', () => {
  const cases: [string, unknown][] = [
    ['three real poles 5e-5 apart: -2, -2.0001, -1.9999', zpkWithDcGain([re(-2), re(-2.0001), re(-1.9999)])],
    ['four real poles 5e-4 apart: -2, -2.001, -1.999, -2.002', zpkWithDcGain([re(-2), re(-2.001), re(-1.999), re(-2.002)])],
    [
      'three complex pairs 3.5e-5 apart near -1 +/- 3j, with a zero at -0.5',
      zpkWithDcGain([...pairOf(-1, 3), ...pairOf(-1.0001, 3.00005), ...pairOf(-0.9999, 2.99995)], [re(-0.5)]),
    ],
    ['five real poles 1e-3 apart near -4, and a pair at -1 +/- 2j', zpkWithDcGain([re(-4), re(-4.004), re(-3.996), re(-4.008), re(-3.992), ...pairOf(-1, 2)])],
  ];
  it.each(cases)('%s: metrics agree with dense reference sampling plus refinement', (_name, design) => {
    const model = parseDesign(design);
    expect(modalSpread(partialFractions(model), 1) * 2.220446049250313e-16).toBeGreaterThan(MAX_ROUNDING);
    const { metrics, notes } = computeStepMetrics(model, 2);
    expect(notes.join(' ')).not.toMatch(/ill-conditioned/);
    const m = metrics as StepMetrics;
    expectMatchesOdex(model, m);
  });
});

// n identical first-order lags, 1/(s+1)^n: y(t) = 1 - e^{-t} sum_{k<n} t^k / k!,
// the regularized incomplete gamma function P(n, t) (Abramowitz & Stegun,
// Handbook of Mathematical Functions, 6.5.13, from memory; it also follows
// from the transform pair t^k e^{-t} / k! <-> 1/(s+1)^{k+1}, Ogata Appendix A).
// Reference times by bisection on that closed form, here in the test.
describe('n identical lags against the incomplete gamma function', () => {
  const closedForm = (n: number, t: number): number => {
    let term = 1;
    let sum = 1;
    for (let k = 1; k < n; k++) {
      term *= t / k;
      sum += term;
    }
    return 1 - Math.exp(-t) * sum;
  };
  const crossing = (n: number, level: number): number => {
    let lo = 0;
    let hi = 10 * n + 50;
    for (let i = 0; i < 200; i++) {
      const mid = 0.5 * (lo + hi);
      if (closedForm(n, mid) < level) lo = mid;
      else hi = mid;
    }
    return 0.5 * (lo + hi);
  };
  const binomial = (n: number): number[] => {
    const c = [1];
    for (let i = 0; i < n; i++) {
      c.push(0);
      for (let k = c.length - 1; k > 0; k--) c[k] = (c[k] as number) + (c[k - 1] as number);
    }
    return c;
  };
  it.each([
    ['coefficients', 8],
    ['coefficients', 24],
    ['poles', 8],
    ['poles', 40],
  ] as const)('1/(s+1)^n given as %s, n = %i: settling and rise time exact, no overshoot', (form, n) => {
    const design = form === 'coefficients' ? { numerator: [1], denominator: binomial(n) } : { poles: Array.from({ length: n }, () => re(-1)), gain: 1 };
    const m = metricsOf(design);
    assertClose(m.settlingTime, crossing(n, 0.98), 1e-9);
    assertClose(m.riseTime, crossing(n, 0.9) - crossing(n, 0.1), 1e-9);
    expect(m.overshootPct).toBe(0);
  });

  it('1/(s+1)^30 as coefficients: its roots cannot be found in double precision, so the design is refused, naming the denominator', () => {
    // (s+1)^30's computed roots spread over about 0.3 (eps^(1/30)); given as poles it is exact (above)
    let error: unknown;
    try {
      parseDesign({ numerator: [1], denominator: binomial(30) });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(SpecInputError);
    expect((error as SpecInputError).code).toBe('roots_ill_determined');
    expect((error as SpecInputError).path).toBe('denominator');
    expect((error as SpecInputError).message).toMatch(/poles of these coefficients cannot be found accurately .*enter the model in zero-pole-gain form/);
  });
});

describe('computeStepMetrics pitfalls', () => {
  it('biproper (2s + 1)/(s + 1): y(0+) = 2 counts as 100 % overshoot at t = 0, Ts = ln 50', () => {
    // y = 1 + e^{-t} (Nise ch. 4: first-order response plus the direct term)
    const { metrics, notes } = computeStepMetrics(parseDesign({ numerator: [2, 1], denominator: [1, 1] }), 2);
    assertClose(metrics?.overshootPct, 100, 1e-12);
    expect(metrics?.peakTime).toBe(0);
    assertClose(metrics?.settlingTime, Math.log(50), 1e-10);
    expect(metrics?.riseTime).toBe(0);
    expect(notes.join(' ')).toMatch(/direct feedthrough/);
  });

  it('negative DC gain: metrics of -G equal those of G, final value negative', () => {
    const pos = metricsOf(zpkWithDcGain([...pairOf(-2, 3), re(-15)]));
    const neg = metricsOf(zpkWithDcGain([...pairOf(-2, 3), re(-15)], [], -1));
    assertClose(neg.finalValue, -1, 1e-12);
    for (const k of ['overshootPct', 'peakTime', 'settlingTime', 'riseTime'] as const) assertClose(neg[k], pos[k] as number, 1e-12);
    expect(neg.undershootPct).toBe(0);
  });

  it('a fast lightly damped pair (wn = 2000, zeta = 0.02): the peak is exact, not limited by a time grid', () => {
    const zeta = 0.02;
    const wn = 2000;
    const m = metricsOf(standard(zeta, wn));
    // a 1 ms grid would put samples ~2/3 of a period apart; the closed forms (Nise ch. 4):
    assertClose(m.peakTime, Math.PI / (wn * Math.sqrt(1 - zeta * zeta)), 1e-10);
    assertClose(m.overshootPct, 100 * Math.exp((-zeta * Math.PI) / Math.sqrt(1 - zeta * zeta)), 1e-10);
  });

  it('non-minimum-phase 2(1 - s)/((s + 1)(s + 2)): undershoot against odex', () => {
    const design = { numerator: [-2, 2], denominator: [1, 3, 2] };
    const m = metricsOf(design);
    const ref = referenceMetrics([-2, 2], [1, 3, 2], 1, 2, 10, 40000);
    expect(m.undershootPct).toBeGreaterThan(10);
    assertClose(m.undershootPct, ref.undershootPct, 1e-6);
    assertClose(m.settlingTime, ref.settlingTime, 1e-4);
  });

  it.each([
    ['unstable', { poles: [re(0.5), re(-3)], gain: 1 }, /right half-plane/],
    ['unstable pair', { poles: pairOf(0.2, 3), gain: 9 }, /\+0\.2 ± 3j are in the right half-plane/],
    ['marginal', { poles: [...pairOf(0, 2), re(-1)], gain: 4 }, /±2j make the response oscillate without settling/],
    ['integrating', { poles: [re(0), re(-2)], gain: 2 }, /pole at 0 makes the response ramp/],
    ['double integrator', { poles: [re(0), re(0), re(-2)], gain: 2 }, /2 poles at 0/],
  ])('%s model: metrics null with the reason', (_name, design, reason) => {
    const { metrics, notes } = computeStepMetrics(parseDesign(design), 2);
    expect(metrics).toBeNull();
    expect(notes.join(' ')).toMatch(reason);
  });

  it('a zero at the origin: final value 0, metrics null with a note', () => {
    const { metrics, notes } = computeStepMetrics(parseDesign({ poles: pairOf(-1, 2), zeros: [re(0)], gain: 5 }), 2);
    expect(metrics).toBeNull();
    expect(notes.join(' ')).toMatch(/final value is zero/);
  });

  it('settling is the last exit, not the first entry (zeta = 0.1 passes through the band early)', () => {
    const zeta = 0.1;
    const m = metricsOf(standard(zeta, 1));
    // first entry: c rises through 0.98 before the first peak
    expect(m.settlingTime).toBeGreaterThan(10 * (m.peakTime as number));
    const ref = referenceMetrics([1], [1, 0.2, 1], 1, 2, 60, 60000);
    assertClose(m.settlingTime, ref.settlingTime, 1e-4);
  });

  it('a peak after the first band entry: two lightly damped modes beating, against odex', () => {
    const design = zpkWithDcGain([...pairOf(-0.05, 10), ...pairOf(-0.05, 11)]);
    const model = parseDesign(design);
    const m = metricsOf(design);
    const ref = referenceMetrics(model.numerator, model.denominator, 1, 2, 1.2 * m.settlingTime, 400000);
    // the global peak is at the first beat maximum (near t = pi), long after r first enters the band
    expect(m.peakTime).toBeGreaterThan(2);
    assertClose(m.peakTime, ref.peakTime as number, 1e-4);
    assertClose(m.overshootPct, ref.overshootPct, 1e-5);
    assertClose(m.settlingTime, ref.settlingTime, 1e-4);
    assertClose(m.undershootPct, ref.undershootPct, 1e-5);
  });

  it('a slow tail from a nearly cancelled slow pole sets the settling time', () => {
    // residue of the pole at -0.1 is about 10 % of y_f: settles only when it decays
    const design = zpkWithDcGain([re(-0.1), ...pairOf(-5, 5)], [re(-0.11)]);
    const model = parseDesign(design);
    const m = metricsOf(design);
    const ref = referenceMetrics(model.numerator, model.denominator, 1, 2, 40, 40000);
    expect(m.settlingTime).toBeGreaterThan(5);
    assertClose(m.settlingTime, ref.settlingTime, 1e-4);
  });

  it('a 200-pole model whose modal terms cancel: metrics null with a note, not noise', () => {
    const poles = Array.from({ length: 100 }, (_, k) => pairOf(-0.5 - k * 0.05, 1 + k * 0.1)).flat();
    const { metrics, notes } = computeStepMetrics(parseDesign({ poles, gain: 1 }), 2);
    expect(metrics).toBeNull();
    expect(notes.join(' ')).toMatch(/too ill-conditioned/);
  });

  it('a pure gain settles at once', () => {
    const m = metricsOf({ numerator: [3], denominator: [1] });
    expect(m).toMatchObject({ finalValue: 3, overshootPct: 0, undershootPct: 0, peakTime: null, settlingTime: 0, riseTime: 0 });
  });
});
