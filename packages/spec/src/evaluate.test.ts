import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { assertClose } from '../test/asserts.js';
import { requirementsArb } from '../test/requirement-arbitraries.js';
import { evaluate } from './evaluate.js';
import { SpecInputError } from './spec-input-error.js';
import type { Complex } from './types.js';

// T(s) = 100 / (s^2 + 15 s + 100): omega_n = 10, zeta = 0.75, Tp ≈ 0.475 s,
// %OS ≈ 2.838 %, Ts ≈ 0.533 s (4 / sigma), Tr ≈ 0.23 s (Nise, Control Systems Engineering, ch. 4 worked example, from memory).
const nise = { id: 'nise-4', numerator: [100], denominator: [1, 15, 100] };

describe('evaluate', () => {
  it('reproduces the worked example: exact metrics and estimate (Nise ch. 4, from memory)', () => {
    const a = evaluate(nise);
    expect(a.id).toBe('nise-4');
    expect(a.stable).toBe(true);
    assertClose(a.dcGain, 1, 1e-12);
    assertClose(a.metrics?.overshootPct, 2.838, 1e-3);
    assertClose(a.metrics?.peakTime, 0.475, 2e-3);
    assertClose(a.metrics?.riseTime, 0.23, 0.02);
    assertClose(a.estimate?.settlingTime, 0.533, 1e-3);
    assertClose(a.estimate?.overshootPct, 2.838, 1e-3);
    assertClose(a.dominant?.dampingRatio, 0.75, 1e-12);
    assertClose(a.dominant?.naturalFrequency, 10, 1e-12);
    expect(a.verdict).toBeNull();
    expect(a.regionPass).toBeNull();
    expect(a.checks).toEqual([]);
    expect(typeof a.engineVersion).toBe('string');
  });

  it('passes the worked example against limits it meets and fails it against one it misses', () => {
    const ok = evaluate(nise, { maxOvershootPct: 5, maxPeakTime: 0.6, maxRiseTime: 0.3, minDampingRatio: 0.7, maxNaturalFrequency: 12 });
    expect(ok.checks.map((c) => c.status)).toEqual(['pass', 'pass', 'pass', 'pass', 'pass']);
    expect(ok.verdict).toBe('compliant');
    expect(ok.regionPass).toBe(true);
    const bad = evaluate(nise, { maxOvershootPct: 2, maxPeakTime: 0.6 });
    expect(bad.checks.map((c) => c.status)).toEqual(['fail', 'pass']);
    expect(bad.verdict).toBe('noncompliant');
    expect(bad.regionPass).toBe(false);
  });

  it('reads the contract design: dominant pair -2 +/- j3 with a pole at -15, ratio 7.5 (15 / 2)', () => {
    const a = evaluate(
      { poles: [{ re: -2, im: 3 }, { re: -2, im: -3 }, { re: -15, im: 0 }], zeros: [], gain: 195 },
      { maxOvershootPct: 30 },
    );
    assertClose(a.dcGain, 1, 1e-12);
    assertClose(a.dominant?.ratio, 7.5, 1e-12);
    expect(a.dominant?.approximationValid).toBe(true);
  });

  it('makes an unstable model a valid assessment: stable false, metrics null, every check fails with the reason', () => {
    const a = evaluate({ poles: [{ re: 1, im: 2 }, { re: 1, im: -2 }], gain: 5 }, { maxOvershootPct: 10, maxSettlingTime: 1 });
    expect(a.stable).toBe(false);
    expect(a.metrics).toBeNull();
    expect(a.estimate).toBeNull();
    expect(a.regionPass).toBe(false);
    expect(a.verdict).toBe('noncompliant');
    for (const c of a.checks) {
      expect(c.status).toBe('fail');
      expect(c.reason).toMatch(/not stable/);
    }
    expect(a.notes.join(' ')).toMatch(/not stable/);
  });

  it('says how far the second-order estimate is off when a slow zero makes it mislead', () => {
    // A zero at -1 near the pair -0.6 +/- j0.8 (zeta 0.6, omega_n 1) raises the overshoot well above the 9.5 % of the pair alone.
    const a = evaluate({ poles: [{ re: -0.6, im: 0.8 }, { re: -0.6, im: -0.8 }], zeros: [{ re: -1, im: 0 }], gain: 1 }, { maxOvershootPct: 12 });
    const est = a.estimate?.overshootPct ?? 0;
    const exact = a.metrics?.overshootPct ?? 0;
    expect(exact - est).toBeGreaterThan(2);
    const note = a.dominant?.notes.find((n) => n.startsWith('the second-order estimate of overshoot is off by'));
    expect(note).toBeDefined();
    expect(note).toContain(`off by ${String(Number(Math.abs(est - exact).toPrecision(3)))} points`);
    expect(a.dominant?.notes.some((n) => n.includes('would pass, but the exact response fails it'))).toBe(exact > 12 && est <= 12);
  });

  it('scales every time by 1 / a and keeps the overshoot when the s-plane is scaled by a (exact relation, property test)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 0.9, noNaN: true }),
        fc.double({ min: 0.5, max: 5, noNaN: true }),
        fc.double({ min: 3, max: 20, noNaN: true }),
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        (zeta, wn, far, a) => {
          const poles: Complex[] = [
            { re: -zeta * wn, im: wn * Math.sqrt(1 - zeta * zeta) },
            { re: -zeta * wn, im: -wn * Math.sqrt(1 - zeta * zeta) },
            { re: -far * wn, im: 0 },
          ];
          const gain = wn * wn * far * wn;
          const scaled = poles.map((p) => ({ re: a * p.re, im: a * p.im }));
          const m1 = evaluate({ poles, gain }).metrics;
          const m2 = evaluate({ poles: scaled, gain: gain * a * a * a }).metrics;
          assertClose(m2?.overshootPct, m1?.overshootPct ?? NaN, 1e-6, 1e-6);
          assertClose(m2?.settlingTime, (m1?.settlingTime ?? NaN) / a, 1e-6);
          assertClose(m2?.riseTime, (m1?.riseTime ?? NaN) / a, 1e-6);
        },
      ),
      { numRuns: 100 },
    );
  }, 120_000);

  it('passes a check exactly when its margin is at least the guard band (exact relation, property test)', () => {
    const design = fc.record({
      zeta: fc.double({ min: 0.2, max: 0.95, noNaN: true }),
      wn: fc.double({ min: 1, max: 20, noNaN: true }),
      far: fc.double({ min: 1.5, max: 30, noNaN: true }),
    });
    fc.assert(
      fc.property(design, requirementsArb, ({ zeta, wn, far }, req) => {
        const wd = wn * Math.sqrt(1 - zeta * zeta);
        const poles = [{ re: -zeta * wn, im: wd }, { re: -zeta * wn, im: -wd }, { re: -far * zeta * wn, im: 0 }];
        const a = evaluate({ poles, gain: wn * wn * far * zeta * wn }, req);
        const m = req.marginPct ?? 0;
        for (const c of a.checks) {
          if (c.status === 'n/a' || c.marginPct === null) continue;
          if (Math.abs(c.marginPct - m) < 1e-9) continue;
          expect(c.status === 'pass').toBe(c.marginPct > m);
        }
        expect(a.verdict === 'compliant').toBe(a.checks.every((c) => c.status !== 'fail'));
      }),
      { numRuns: 300 },
    );
  }, 120_000);

  it('throws only SpecInputError on garbage designs and requirement sets (property test)', () => {
    const num = fc.oneof(fc.double(), fc.integer(), fc.constant(0));
    const root = fc.record({ re: num, im: num }, { requiredKeys: [] });
    const design = fc.oneof(
      fc.anything(),
      fc.record({ poles: fc.array(root, { maxLength: 6 }), zeros: fc.array(root, { maxLength: 6 }), gain: num }, { requiredKeys: [] }),
      fc.record({ numerator: fc.array(num, { maxLength: 6 }), denominator: fc.array(num, { maxLength: 7 }) }, { requiredKeys: [] }),
    );
    const requirements = fc.oneof(fc.constant(undefined), fc.anything(), requirementsArb);
    fc.assert(
      fc.property(design, requirements, (d, r) => {
        try {
          const a = evaluate(d, r);
          expect(typeof a.stable).toBe('boolean');
        } catch (e) {
          if (!(e instanceof SpecInputError)) throw e;
          expect(e.message.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 1000 },
    );
  }, 120_000);
});
