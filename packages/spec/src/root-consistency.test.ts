import { describe, expect, it } from 'vitest';
import { rootConsistency } from './root-consistency.js';
import { parseDesign } from './parse-design.js';
import { polyFromRoots } from './poly-from-roots.js';
import { computeStepMetrics } from './step-metrics.js';
import type { Model } from './types.js';
import { pairOf, re } from '../test/design-builders.js';
import { referenceMetrics } from '../test/ode-reference.js';
import { assertClose } from '../test/asserts.js';

describe('rootConsistency: do the computed poles and zeros stand for the coefficients?', () => {
  it('a well-conditioned polynomial: its roots reproduce G(jw) to round-off', () => {
    const den = polyFromRoots([...pairOf(-2, 3), re(-15), re(-40)]);
    const rc = rootConsistency(parseDesign({ numerator: [3, den[den.length - 1] as number], denominator: den }));
    expect(rc.ok).toBe(true);
    expect(rc.worst).toBeLessThan(1e-13);
  });

  it('roots that belong to another polynomial are caught, at the frequency where they differ most', () => {
    const good = parseDesign({ numerator: [6], denominator: [1, 5, 6] }); // poles -2, -3
    const wrong: Model = { ...good, poles: [re(-2), re(-3.001)] };
    const rc = rootConsistency(wrong);
    expect(rc.ok).toBe(false);
    // G(0) from the roots is 6 / (2 * 3.001) against 1: off by 1 - 3/3.001
    assertClose(rc.worst, 1 - 3 / 3.001, 1e-3);
    expect(rc.at).toBe(0);
  });

  it('two quadruple poles 1 % apart: refused as coefficients (the roots found are off by 8e-4), exact as poles (against odex)', () => {
    const poles = [re(-1), re(-1), re(-1), re(-1), re(-1.01), re(-1.01), re(-1.01), re(-1.01)];
    const den = polyFromRoots(poles);
    const dc = den[den.length - 1] as number;
    expect(() => parseDesign({ numerator: [dc], denominator: den })).toThrow(/enter the model in zero-pole-gain form/);
    const model = parseDesign({ poles, gain: dc });
    const m = computeStepMetrics(model, 2).metrics;
    expect(m).not.toBeNull();
    const ref = referenceMetrics(model.numerator, model.denominator, 1, 2, 1.3 * (m?.settlingTime ?? 0) + 1, 40000);
    assertClose(m?.settlingTime, ref.settlingTime, 1e-4);
    assertClose(m?.riseTime, ref.riseTime, 1e-4);
  });

  it('roots a little off (1e-7) leave poles and plots usable but not exact metrics: computeStepMetrics refuses them with the reason', () => {
    const good = parseDesign({ numerator: [6], denominator: [1, 5, 6] });
    const slightly: Model = { ...good, poles: [re(-2), re(-3.0000003)] };
    const rc = rootConsistency(slightly);
    expect(rc.ok).toBe(false);
    expect(rc.worst).toBeLessThan(1e-6);
    const { metrics, notes } = computeStepMetrics(slightly, 2);
    expect(metrics).toBeNull();
    expect(notes.join(' ')).toMatch(/the poles found for these coefficients do not reproduce the model closely enough for exact metrics/);
  });
});
