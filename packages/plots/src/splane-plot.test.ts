import { describe, expect, it } from 'vitest';

import { splanePlot } from './splane-plot.js';
import { splaneViewport } from './splane-viewport.js';

const viewport = { reMin: -10, reMax: 2, imMin: -6, imMax: 6 };
// 400 x 300 box with 50 px margins all round: a 300 x 200 frame at (50, 50).
const margin = { top: 50, right: 50, bottom: 50, left: 50 };

function numbers(d: string): number[] {
  return (d.match(/-?\d+(\.\d+)?(e-?\d+)?/g) ?? []).map(Number);
}

describe('splanePlot', () => {
  const plot = splanePlot({
    width: 400,
    height: 300,
    margin,
    viewport,
    poles: [{ re: -2, im: 3 }, { re: -2, im: -3 }, { re: -15, im: 0 }],
    zeros: [{ re: -4, im: 0 }],
    dominantPoles: [{ re: -2, im: 3 }, { re: -2, im: -3 }],
    dominanceRatio: 5,
    region: {
      polygons: [{ points: [{ re: -1, im: 0 }, { re: -8, im: 0 }, { re: -8, im: 5 }, { re: -1, im: 0 }] }],
      boundaries: [
        { limit: 'maxSettlingTime', label: 'sigma >= 1 1/s from 4 s settling time', points: [{ re: -1, im: 6 }, { re: -1, im: -6 }], binding: true },
        { limit: 'maxPeakTime', label: 'omega_d >= 2 rad/s', points: [{ re: -10, im: 2 }, { re: 0, im: 2 }] },
        { limit: 'maxPeakTime', label: 'omega_d >= 2 rad/s', points: [{ re: -10, im: -2 }, { re: 0, im: -2 }] },
      ],
    },
  });

  it('maps a pole at -2 + 3j to x = 50 + 300 (8/12), y = 50 + 200 (3/12)', () => {
    // re -2 is 8 units right of -10 out of 12; im 3 is 3 units below +6 out of 12.
    const pole = plot.poleMarks.find((p) => p.re === -2 && p.im === 3)!;
    expect(pole.x).toBeCloseTo(250, 6);
    expect(pole.y).toBeCloseTo(100, 6);
  });

  it('draws a pole as an x centred on its position and a zero as a closed circle', () => {
    const pole = plot.poleMarks[0]!;
    const xs = numbers(pole.d).filter((_, i) => i % 2 === 0);
    expect((Math.min(...xs) + Math.max(...xs)) / 2).toBeCloseTo(pole.x, 2);
    const zero = plot.zeroMarks[0]!;
    expect(zero.x).toBeCloseTo(50 + 300 * (6 / 12), 6);
    expect(zero.d.endsWith('Z')).toBe(true);
    expect(zero.d).toMatch(/A/);
  });

  it('leaves a pole outside the viewport off the plot and marks it on the left edge', () => {
    expect(plot.poleMarks.some((p) => p.re === -15)).toBe(false);
    const off = plot.offPlot.find((p) => p.re === -15)!;
    expect(off.x).toBe(50);
    expect(off.label.text).toContain('-15');
  });

  it('closes every region path', () => {
    expect(plot.regionPaths).toHaveLength(1);
    for (const d of plot.regionPaths) {
      expect(d.startsWith('M')).toBe(true);
      expect(d.endsWith('Z')).toBe(true);
    }
  });

  it('gives one boundary path, one key and one label anchor per limit', () => {
    expect(plot.boundaryPaths.map((b) => [b.limit, b.key])).toEqual([
      ['maxSettlingTime', 1],
      ['maxPeakTime', 2],
    ]);
    const peak = plot.boundaryPaths[1]!;
    expect(peak.d.match(/M/g)).toHaveLength(2); // both lines omega_d = +-2
    for (const b of plot.boundaryPaths) {
      expect(b.anchor.x).toBeGreaterThanOrEqual(plot.frame.x);
      expect(b.anchor.x).toBeLessThanOrEqual(plot.frame.x + plot.frame.width);
    }
    // The settling-time line is vertical at re = -1: its anchor lies on it.
    expect(plot.boundaryPaths[0]!.anchor.x).toBeCloseTo(50 + 300 * (9 / 12), 1);
  });

  it('rings each dominant pole and puts the dominance threshold at 5 x -2 = -10', () => {
    expect(plot.dominantRings).toHaveLength(2);
    expect(plot.dominanceLine!.re).toBe(-10);
    expect(plot.dominanceLine!.x).toBeCloseTo(50, 6);
  });

  it('draws the real axis at y = 150 and the imaginary axis at x = 50 + 300 (10/12)', () => {
    expect(plot.realAxisPath).toBe('M50,150L350,150');
    expect(plot.imaginaryAxisPath).toBe('M300,50L300,250');
  });

  it('puts ticks at round numbers at their pixel positions', () => {
    for (const t of plot.xAxis.ticks) {
      expect(Math.abs(t.value / plot.xAxis.step - Math.round(t.value / plot.xAxis.step))).toBeLessThan(1e-9);
      expect(t.position).toBeCloseTo(50 + (300 * (t.value + 10)) / 12, 6);
    }
    expect(plot.xAxis.ticks.map((t) => t.label)).toContain('0');
  });
});

describe('splaneViewport', () => {
  it('shows the dominant pair, the dominance threshold and the origin, with one scale on both axes', () => {
    const v = splaneViewport({
      poles: [{ re: -2, im: 3 }, { re: -2, im: -3 }, { re: -15, im: 0 }],
      dominantPoles: [{ re: -2, im: 3 }, { re: -2, im: -3 }],
      dominanceRatio: 5,
      width: 300,
      height: 200,
    });
    expect(v.reMin).toBeLessThan(-10);
    expect(v.reMax).toBeGreaterThan(0);
    expect(v.imMax).toBeGreaterThan(3);
    expect(v.imMin).toBe(-v.imMax);
    expect((v.reMax - v.reMin) / (v.imMax - v.imMin)).toBeCloseTo(300 / 200, 9);
  });

  it('leaves out a pole far beyond the rest', () => {
    const v = splaneViewport({
      poles: [{ re: -1, im: 1 }, { re: -1, im: -1 }, { re: -500, im: 0 }],
      dominantPoles: [{ re: -1, im: 1 }, { re: -1, im: -1 }],
      dominanceRatio: 5,
      width: 300,
      height: 200,
    });
    expect(v.reMin).toBeGreaterThan(-500);
  });
});

describe('splanePlot dominance-threshold label', () => {
  const base = { width: 400, height: 300, margin, poles: [{ re: -2, im: 3 }, { re: -2, im: -3 }], zeros: [], dominantPoles: [{ re: -2, im: 3 }, { re: -2, im: -3 }], dominanceRatio: 5 };

  it('sits right of the threshold line when it fits there', () => {
    const plot = splanePlot({ ...base, viewport: { reMin: -12, reMax: 30, imMin: -6, imMax: 6 } });
    expect(plot.dominanceLine!.label.anchor).toBe('start');
  });

  it('goes to the left of the line when the right edge of the frame would cut it', () => {
    // The threshold at -10 is 1 unit from the right edge of a -40 .. -9 window.
    const plot = splanePlot({ ...base, viewport: { reMin: -40, reMax: -9, imMin: -6, imMax: 6 } });
    const l = plot.dominanceLine!.label;
    expect(l.anchor).toBe('end');
    expect(l.x).toBeLessThan(plot.dominanceLine!.x);
    expect(l.x - l.text.length * 11 * 0.55).toBeGreaterThanOrEqual(plot.frame.x);
  });
});
