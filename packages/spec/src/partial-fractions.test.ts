import { describe, expect, it } from 'vitest';
import { clusteredPartialFractions, partialFractions, type ModalForm } from './partial-fractions.js';
import { packResponse } from './pack-response.js';
import { evalResponse } from './eval-response.js';
import { stepResponse } from './step-response.js';
import { parseDesign } from './parse-design.js';
import { assertClose } from '../test/asserts.js';
import { pairOf, re } from '../test/design-builders.js';

// Laplace transform pairs as tabulated in Nise ch. 2 (Table 2.1/2.2) and
// Ogata Appendix A: 1/(s (s+a)^2) <-> (1 - e^{-at} - a t e^{-at}) / a^2,
// 1/(s (s+a)^3) <-> (1 - e^{-at}(1 + a t + a^2 t^2 / 2)) / a^3.
describe('partialFractions', () => {
  it('double pole: 1/(s (s+a)^2) matches the transform table', () => {
    const a = 3;
    const y = stepResponse(parseDesign({ poles: [re(-a), re(-a)], gain: 1 }));
    for (const t of [0, 0.1, 0.5, 1, 2, 5]) {
      assertClose(y.value(t), (1 - Math.exp(-a * t) - a * t * Math.exp(-a * t)) / (a * a), 1e-13, 1e-3);
    }
  });

  it('triple pole: 1/(s (s+a)^3) matches the transform table, exact coefficients', () => {
    const a = 2;
    const form = partialFractions(parseDesign({ poles: [re(-a), re(-a), re(-a)], gain: 1 }));
    const pole = form.terms.find((t) => t.sigma === -a);
    expect(pole?.multiplicity).toBe(3);
    const c = pole?.cos ?? [];
    assertClose(c[0], -1 / a ** 3, 1e-14);
    assertClose(c[1], -1 / a ** 2, 1e-14);
    assertClose(c[2], -1 / (2 * a), 1e-14);
  });

  it('a conjugate pair just too far apart to be clustered keeps its imaginary part (no equal real poles, no NaN)', () => {
    // -100 +/- 0.001j: the pair is 2e-5 of |p| apart, outside the 1e-5
    // cluster tolerance, while its imaginary part alone is 1e-5 of |p|.
    // (A property test found this: before, both poles were snapped to one
    // real value, counted once each, and the residues came out NaN.)
    // Near coincidence the response tends to the double pole's transform pair
    // above: 1/(s (s+a)^2) <-> (1 - e^{-at} - a t e^{-at}) / a^2.
    const a = 99.99999999500001;
    const w = 0.0010000000000000002;
    const model = parseDesign({ poles: [{ re: -a, im: w }, { re: -a, im: -w }], gain: a * a + w * w });
    const form = partialFractions(model);
    for (const term of form.terms) for (const c of [...term.cos, ...term.sin]) expect(Number.isFinite(c)).toBe(true);
    expect(form.terms.find((t) => t.sigma === -a)?.omega).toBe(w);
    const y = stepResponse(model);
    for (const t of [0, 0.005, 0.01, 0.03, 0.1]) assertClose(y.value(t), 1 - Math.exp(-a * t) - a * t * Math.exp(-a * t), 1e-9, 1e-9);
  });

  it('numerically repeated poles from root finding are clustered (tolerance 1e-5 relative)', () => {
    const close = parseDesign({ poles: [re(-1), re(-1 - 1e-8), re(-4)], gain: 4 });
    const form = partialFractions(close);
    expect(form.terms.find((t) => Math.abs(t.sigma + 1) < 1e-6)?.multiplicity).toBe(2);
    // and the response matches the exact double-pole model to round-off
    const exact = stepResponse(parseDesign({ poles: [re(-1), re(-1), re(-4)], gain: 4 }));
    const near = stepResponse(close);
    for (const t of [0.2, 1, 3]) assertClose(near.value(t), exact.value(t), 1e-7);
  });

  it('a near pole-zero cancellation gives a small residue, not a blow-up', () => {
    const form = partialFractions(parseDesign({ poles: [re(-1), ...pairOf(-2, 3)], zeros: [re(-1 - 1e-7)], gain: 13 }));
    const slow = form.terms.find((t) => t.sigma === -1);
    expect(Math.abs(slow?.cos[0] ?? 1)).toBeLessThan(1e-6);
  });

  it('biproper: y(0+) = D, the feedthrough', () => {
    const y = stepResponse(parseDesign({ numerator: [3, 1], denominator: [1, 2] }));
    expect(y.initialValue).toBe(3);
    assertClose(y.value(0), 3, 1e-14);
    assertClose(y.finalValue, 0.5, 1e-15);
    assertClose(y.value(40), 0.5, 1e-12);
  });

  it('conjugate pairs become real cos/sin terms: 1/(s((s+1)^2+4)) against the table', () => {
    // Nise Table 2.2: e^{-at}(cos wt) and e^{-at} sin wt pairs
    const y = stepResponse(parseDesign({ poles: pairOf(-1, 2), gain: 5 }));
    for (const t of [0.3, 1.1, 2.5]) {
      assertClose(y.value(t), 1 - Math.exp(-t) * (Math.cos(2 * t) + 0.5 * Math.sin(2 * t)), 1e-13);
      assertClose(y.derivative(t), 2.5 * Math.exp(-t) * Math.sin(2 * t), 1e-12, 1e-3);
    }
  });

  // A cluster's terms summed by expansion about its mean (partial-fractions.ts header).
  const valueOf = (form: ModalForm, t: number): number => {
    const out = new Float64Array(1);
    evalResponse(packResponse(form, 1), t, 1, out);
    return out[0] as number;
  };

  it('a cluster 1e-2 apart, summed by expansion, matches 1/(s (s+a)(s+b)) from the transform table', () => {
    // Nise Table 2.2 / Ogata Appendix A, by partial fractions:
    // 1/(s (s+a)(s+b)) <-> 1/(ab) + e^{-at}/(a (a-b)) + e^{-bt}/(b (b-a)).
    // Merged into a double pole without the expansion's terms the response
    // would be off by about 2e-5 here.
    const a = 1;
    const b = 1.01;
    const form = clusteredPartialFractions(parseDesign({ poles: [re(-a), re(-b)], gain: 1 }), 2e-2) as ModalForm;
    expect(form).not.toBeNull();
    expect(form.terms.some((t) => t.sigma === -(a + b) / 2 && t.multiplicity > 2)).toBe(true);
    for (const t of [0.1, 0.7, 2, 5, 12, 30]) {
      const table = 1 / (a * b) + Math.exp(-a * t) / (a * (a - b)) + Math.exp(-b * t) / (b * (b - a));
      assertClose(valueOf(form, t), table, 1e-12, 1);
    }
  });

  it('a cluster of two complex pairs 1e-2 apart agrees with their separate (well-conditioned) modal terms', () => {
    const model = parseDesign({ poles: [...pairOf(-1, 3), ...pairOf(-1.01, 3.02)], zeros: [re(-2)], gain: 5 });
    const apart = partialFractions(model);
    expect(apart.terms.filter((t) => t.omega > 0)).toHaveLength(2);
    const together = clusteredPartialFractions(model, 2e-2) as ModalForm;
    expect(together.terms.filter((t) => t.omega > 0)).toHaveLength(1);
    for (const t of [0.05, 0.4, 1.5, 4, 9]) assertClose(valueOf(together, t), valueOf(apart, t), 1e-12, 1);
  });

  it('a cluster too wide for its circle (offsets over a quarter of the way to the next pole) is refused', () => {
    // -1, -1.2, -1.4 chain into one cluster at tolerance 0.2, with the step's pole at 0 only 1.2 away
    expect(clusteredPartialFractions(parseDesign({ poles: [re(-1), re(-1.2), re(-1.4)], gain: 1 }), 0.2)).toBeNull();
  });
});
