import { describe, expect, it } from 'vitest';
import { stepResponse } from './step-response.js';
import { parseDesign } from './parse-design.js';
import { assertClose } from '../test/asserts.js';
import { odeStepResponse } from '../test/ode-reference.js';
import { systems } from '../test/reference-systems.js';
import { pairOf, re } from '../test/design-builders.js';

describe('stepResponse against odex (ODEX extrapolation integrator on the state-space realisation)', () => {
  it.each(systems)('%s: y(t) agrees at 400 times', (_name, design) => {
    const model = parseDesign(design);
    const response = stepResponse(model);
    const times = Array.from({ length: 400 }, (_, i) => i * 0.0125);
    const reference = odeStepResponse(model.numerator, model.denominator, times);
    const scale = Math.max(...reference.map(Math.abs));
    times.forEach((t, i) => assertClose(response.value(t), reference[i] as number, 1e-8, scale));
    // analytic derivative against a central difference of the reference
    for (const t of [0.3, 0.9, 2.1]) {
      const [a, b] = odeStepResponse(model.numerator, model.denominator, [t - 1e-5, t + 1e-5]);
      assertClose(response.derivative(t), ((b as number) - (a as number)) / 2e-5, 1e-5, scale);
    }
  });

});

describe('stepResponse', () => {
  it('is zero before the step, and reports G(0) and y(0+)', () => {
    const y = stepResponse(parseDesign({ poles: [...pairOf(-2, 3), re(-15)], zeros: [re(-4)], gain: 10 }));
    expect(y.value(-1)).toBe(0);
    expect(y.initialValue).toBe(0);
    assertClose(y.finalValue, (10 * 4) / (13 * 15), 1e-14);
    assertClose(y.value(0), 0, 1e-12, 1);
  });

  it('an integrating model has no final value but still a response (ramp of slope G(s) s at 0)', () => {
    const y = stepResponse(parseDesign({ poles: [re(0), re(-2)], gain: 2 }));
    expect(y.finalValue).toBeNull();
    // 2/(s^2 (s+2)) <-> t - (1 - e^{-2t})/2 (Laplace table, Nise ch. 2)
    for (const t of [0.5, 3]) assertClose(y.value(t), t - (1 - Math.exp(-2 * t)) / 2, 1e-13);
  });
});
