import { describe, expect, it } from 'vitest';
import { sampleStepResponse } from './sample-step-response.js';
import { stepResponse } from './step-response.js';
import { computeStepMetrics } from './step-metrics.js';
import { parseDesign } from './parse-design.js';
import { assertClose } from '../test/asserts.js';
import { pairOf, re, zpkWithDcGain } from '../test/design-builders.js';

// No reference values here: the samples are checked against the engine's own exact response (checked
// against odex in step-response.test.ts) and for the sampling rules themselves.
describe('sampleStepResponse', () => {
  const model = parseDesign(zpkWithDcGain([...pairOf(-0.5, 6), re(-10)]));

  it('samples the exact response on [0, 1.5 Ts], sorted, at most maxPoints', () => {
    const s = sampleStepResponse(model);
    const ts = computeStepMetrics(model, 2).metrics?.settlingTime as number;
    assertClose(s.tEnd, 1.5 * ts, 1e-12);
    expect(s.t).toHaveLength(400);
    expect(s.t[0]).toBe(0);
    expect(s.t.at(-1)).toBe(s.tEnd);
    for (let i = 1; i < s.t.length; i++) expect(s.t[i] as number).toBeGreaterThan(s.t[i - 1] as number);
    const y = stepResponse(model);
    s.t.forEach((t, i) => expect(s.y[i]).toBe(y.value(t)));
  });

  it('puts more points where the curve bends (the early oscillation) than in the flat tail', () => {
    const s = sampleStepResponse(model, { maxPoints: 300 });
    const third = s.tEnd / 3;
    const early = s.t.filter((t) => t < third).length;
    const late = s.t.filter((t) => t > 2 * third).length;
    expect(early).toBeGreaterThan(2 * late);
  });

  it('honours tEnd and maxPoints', () => {
    const s = sampleStepResponse(model, { tEnd: 2, maxPoints: 50 });
    expect(s.tEnd).toBe(2);
    expect(s.t).toHaveLength(50);
  });

  it('an unstable model gets a short window that shows the growth', () => {
    const model = parseDesign({ poles: [re(0.5), ...pairOf(-2, 3)], gain: 1 });
    const s = sampleStepResponse(model);
    assertClose(s.tEnd, 8, 1e-12); // four time constants of the pole at +0.5
    const y = stepResponse(model);
    expect(Math.abs(s.y.at(-1) as number)).toBeGreaterThan(10 * Math.abs(y.value(s.tEnd / 4)));
  });

  it('marginal and zero-final-value models still get a finite window', () => {
    const integrator = sampleStepResponse(parseDesign({ poles: [re(0), re(-2)], gain: 2 }));
    expect(integrator.tEnd).toBeGreaterThan(0);
    const washout = sampleStepResponse(parseDesign({ poles: [re(-1), re(-3)], zeros: [re(0)], gain: 1 }));
    expect(washout.tEnd).toBeGreaterThan(1);
    expect(Math.abs(washout.y.at(-1) as number)).toBeLessThan(0.1 * Math.max(...washout.y.map(Math.abs)));
  });
});
