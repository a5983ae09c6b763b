import { describe, expect, it } from 'vitest';

import { stepPlot } from './step-plot.js';

// A first-order response y = 1 - exp(-t), sampled; the geometry is checked
// against the linear maps the plot declares (xDomain, yDomain, frame).
const samples = Array.from({ length: 201 }, (_, i) => {
  const t = i * 0.03;
  return { t, y: 1 - Math.exp(-t) };
});

function firstPoint(d: string): [number, number] {
  const m = d.match(/^M(-?[\d.]+),(-?[\d.]+)/)!;
  return [Number(m[1]), Number(m[2])];
}

describe('stepPlot', () => {
  const plot = stepPlot({
    width: 500,
    height: 300,
    samples,
    finalValue: 1,
    settlingBandPct: 2,
    maxOvershootPct: 10,
    maxPeakTime: 2,
    maxSettlingTime: 4.5,
    maxRiseTime: 2.5,
  });
  const { frame } = plot;
  const X = (t: number) => frame.x + ((t - plot.xDomain[0]) / (plot.xDomain[1] - plot.xDomain[0])) * frame.width;
  const Y = (v: number) => frame.y + frame.height - ((v - plot.yDomain[0]) / (plot.yDomain[1] - plot.yDomain[0])) * frame.height;

  it('starts the response path at (t = 0, y = 0) and passes through every sample', () => {
    const [x0, y0] = firstPoint(plot.responsePath);
    expect(x0).toBeCloseTo(X(0), 1);
    expect(y0).toBeCloseTo(Y(0), 1);
    expect(plot.responsePath.match(/L/g)).toHaveLength(samples.length - 1);
  });

  it('keeps the final value, the band and the ceiling inside the y range', () => {
    expect(plot.yDomain[0]).toBeLessThanOrEqual(0);
    expect(plot.yDomain[1]).toBeGreaterThan(1.1);
  });

  it('draws the settling band as a closed rectangle between y = 0.98 and 1.02', () => {
    expect(plot.bandPath!.endsWith('Z')).toBe(true);
    const ys = (plot.bandPath!.match(/,(-?[\d.]+)/g) ?? []).map((s) => Number(s.slice(1)));
    expect(Math.min(...ys)).toBeCloseTo(Y(1.02), 1);
    expect(Math.max(...ys)).toBeCloseTo(Y(0.98), 1);
  });

  it('puts the overshoot ceiling at y = 1.1 and the time limits at their times, each with a label', () => {
    const ceiling = plot.guides.find((g) => g.kind === 'ceiling')!;
    expect(firstPoint(ceiling.d)[1]).toBeCloseTo(Y(1.1), 1);
    expect(ceiling.label.text).toContain('10 %');
    const peak = plot.guides.find((g) => g.kind === 'peak')!;
    expect(firstPoint(peak.d)[0]).toBeCloseTo(X(2), 1);
    const settling = plot.guides.find((g) => g.kind === 'settling')!;
    expect(firstPoint(settling.d)[0]).toBeCloseTo(X(4.5), 1);
    expect(settling.label.text).toContain('4.5 s');
  });

  it('starts the rise-time span where the response first crosses 10 % (t = ln(1/0.9) for 1 - exp(-t))', () => {
    const rise = plot.guides.find((g) => g.kind === 'rise')!;
    expect(firstPoint(rise.d)[0]).toBeCloseTo(X(Math.log(1 / 0.9)), 0);
  });

  it('uses round ticks for time', () => {
    for (const t of plot.xAxis.ticks) expect(Math.abs(t.value / plot.xAxis.step - Math.round(t.value / plot.xAxis.step))).toBeLessThan(1e-9);
    expect(plot.xAxis.ticks[0]!.value).toBe(0);
  });

  it('draws no band, ceiling or rise span without a final value', () => {
    const p = stepPlot({ width: 300, height: 200, samples, finalValue: null, settlingBandPct: 2, maxOvershootPct: 5, maxRiseTime: 1 });
    expect(p.bandPath).toBeNull();
    expect(p.guides).toEqual([]);
    expect(p.responsePath.startsWith('M')).toBe(true);
  });

  it('handles a negative final value: the ceiling lies beyond it, below zero', () => {
    const neg = samples.map((s) => ({ t: s.t, y: -s.y }));
    const p = stepPlot({ width: 300, height: 200, samples: neg, finalValue: -1, maxOvershootPct: 10 });
    expect(p.guides[0]!.value).toBeCloseTo(-1.1, 12);
    expect(p.yDomain[0]).toBeLessThan(-1.1);
  });
});

describe('stepPlot rise-time label', () => {
  const labelSpan = (l: { x: number; text: string; anchor: string }, fontSize = 10): [number, number] => {
    const w = l.text.length * fontSize * 0.55;
    return l.anchor === 'end' ? [l.x - w, l.x] : [l.x, l.x + w];
  };
  const input = { width: 700, height: 300, samples, finalValue: 1, settlingBandPct: 2, maxRiseTime: 0.5, maxSettlingTime: 5 };

  it('stays right of the span when no time limit line stands there', () => {
    const plot = stepPlot(input);
    const rise = plot.guides.find((g) => g.kind === 'rise')!;
    expect(rise.label.anchor).toBe('start');
  });

  it('moves past a peak-time line that would cross it, and no time limit line crosses it', () => {
    // The span ends at t10 + 0.5 = 0.61 s; a peak-time limit at 1 s stands where the label would be.
    const plot = stepPlot({ ...input, maxPeakTime: 1 });
    const rise = plot.guides.find((g) => g.kind === 'rise')!;
    const [from, to] = labelSpan(rise.label);
    for (const g of plot.guides.filter((g) => g.kind === 'peak' || g.kind === 'settling')) {
      const gx = firstPoint(g.d)[0];
      expect(gx < from || gx > to).toBe(true);
    }
    expect(to).toBeLessThanOrEqual(plot.frame.x + plot.frame.width);
  });
});
