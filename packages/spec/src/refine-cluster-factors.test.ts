import { describe, expect, it } from 'vitest';
import { refineClusterFactors } from './refine-cluster-factors.js';
import { polyFromRoots } from './poly-from-roots.js';
import { polyRoots } from './poly-roots.js';
import { parseDesign } from './parse-design.js';
import { computeStepMetrics } from './step-metrics.js';
import { rootConsistency } from './root-consistency.js';
import type { Complex, Model } from './types.js';
import { sortRoots } from './sort-roots.js';
import { pairOf, re } from '../test/design-builders.js';
import { assertClose } from '../test/asserts.js';

// The check values are the roots the test polynomials are built from
// (polyFromRoots), and the zero-pole-gain form of the same model.
describe('refineClusterFactors', () => {
  // Two real poles 3.5e-5 apart next to a third 8e-3 away, with a pair and two
  // more real poles: clustering takes the close two for one double root.
  const poles: Complex[] = [re(-2.801558565537682), re(-0.998772284603175), re(-0.9010106041281041), re(-0.9023717370157394), ...pairOf(-0.2950925506310643, 0.811103088417914), re(-2.793215703252433), re(-2.793312323393451)];
  const den = polyFromRoots(poles);

  it('splits a near-double root taken for an exact one back into its two roots, so the set reproduces the polynomial', () => {
    const clustered = polyRoots(den);
    const model = (p: Complex[]): Model => ({ form: 'polynomial', poles: p, zeros: [], gain: 1, numerator: [1], denominator: den });
    expect(rootConsistency(model(clustered)).ok).toBe(false);
    const refined = refineClusterFactors(den, clustered);
    expect(rootConsistency(model(refined)).ok).toBe(true);
    const near = refined.filter((z) => Math.abs(z.re + 2.7932) < 1e-3).map((z) => z.re).sort((a, b) => b - a);
    expect(near).toHaveLength(2);
    // The pair's factor (its sum and product) comes out to about 1e-10: the
    // root at -2.8016, 8e-3 away, couples to it. Each root of a pair 3.5e-5
    // apart then follows to about 1e-10 / 3.5e-5 relative.
    assertClose((near[0] as number) + (near[1] as number), -2.793215703252433 - 2.793312323393451, 1e-9);
    assertClose((near[0] as number) * (near[1] as number), 2.793215703252433 * 2.793312323393451, 1e-9);
    assertClose(near[0], -2.793215703252433, 1e-5);
    assertClose(near[1], -2.793312323393451, 1e-5);
  });

  it('leaves roots that are not clustered as they are', () => {
    const c = polyFromRoots([re(-1), re(-3), ...pairOf(-2, 5)]);
    const roots = polyRoots(c);
    expect(sortRoots(refineClusterFactors(c, roots))).toEqual(roots);
  });

  it('so that model, given as coefficients, gets the metrics of its zero-pole-gain form', () => {
    let gain = 1;
    for (const p of poles) gain *= Math.hypot(p.re, p.im);
    const zpk = computeStepMetrics(parseDesign({ poles, gain }), 2).metrics;
    const poly = computeStepMetrics(parseDesign({ numerator: [gain], denominator: den }), 2).metrics;
    expect(poly).not.toBeNull();
    assertClose(poly?.settlingTime, zpk?.settlingTime as number, 1e-9);
    assertClose(poly?.riseTime, zpk?.riseTime as number, 1e-9);
    assertClose(poly?.overshootPct, zpk?.overshootPct as number, 1e-9, 1);
  });
});
