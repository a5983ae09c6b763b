import { describe, expect, it } from 'vitest';

import { nearestRoot, panView, splaneGeometry, zoomView } from './splane-geometry';

const view = { reMin: -30, reMax: 5, imMin: -20, imMax: 20 };
const grid = (n: number) => Array.from({ length: n }, (_, i) => ({ re: -1 - (i % 100) * 0.25, im: -10 + Math.floor(i / 100) * 0.2 }));

describe('splaneGeometry(input)', () => {
  it('draws 10,000 poles as one path of 10,000 x marks (two strokes each)', () => {
    const poles = grid(10_000);
    const g = splaneGeometry({ width: 800, height: 500, view, region: null, poles, zeros: [], dominantPoles: [], dominanceRatio: null, markSize: 3 });
    expect(g.markCount).toBe(10_000);
    expect(g.polePath.match(/M/g)?.length).toBe(20_000);
    expect(g.hiddenPoles).toBe(0);
  });

  it('gives the marks as pixel centres instead of paths when asked (for a canvas)', () => {
    const poles = [...grid(300), { re: -500, im: 0 }];
    const g = splaneGeometry({ width: 800, height: 500, view, region: null, poles, zeros: [{ re: -2, im: 1 }], dominantPoles: [], dominanceRatio: null, markSize: 3, asPoints: true });
    expect(g.polePath).toBe('');
    expect(g.polePoints.length).toBe(600);
    expect(g.zeroPoints.length).toBe(2);
    expect(g.markCount).toBe(301);
    expect(g.hiddenPoles).toBe(1);
    const p = g.toPixel(poles[7]!);
    expect([g.polePoints[14], g.polePoints[15]]).toEqual([p.x, p.y]);
  });

  it('counts the poles outside the view instead of drawing them', () => {
    const poles = [...grid(300), { re: -500, im: 0 }];
    const g = splaneGeometry({ width: 800, height: 500, view, region: null, poles, zeros: [], dominantPoles: [], dominanceRatio: null, markSize: 3 });
    expect(g.markCount).toBe(300);
    expect(g.hiddenPoles).toBe(1);
  });

  it('maps the s-plane to pixels and back', () => {
    const g = splaneGeometry({ width: 800, height: 500, view, region: null, poles: [], zeros: [], dominantPoles: [], dominanceRatio: null, markSize: 5 });
    const p = g.toPixel({ re: -7, im: 3 });
    const back = g.toPlane(p.x, p.y);
    expect(back.re).toBeCloseTo(-7, 9);
    expect(back.im).toBeCloseTo(3, 9);
  });
});

describe('view changes', () => {
  it('zoomView keeps the point zoomed about where it was', () => {
    const z = zoomView(view, 0.5, { re: -10, im: 4 });
    expect((-10 - z.reMin) / (z.reMax - z.reMin)).toBeCloseTo((-10 - view.reMin) / (view.reMax - view.reMin), 12);
    expect(z.reMax - z.reMin).toBeCloseTo((view.reMax - view.reMin) / 2, 12);
  });

  it('panView moves both ends by the same amount', () => {
    expect(panView(view, 2, -1)).toEqual({ reMin: -28, reMax: 7, imMin: -21, imMax: 19 });
  });

  it('nearestRoot finds the root under the pointer and nothing farther than the radius', () => {
    const roots = [{ re: -1, im: 0 }, { re: -5, im: 2 }];
    const toPixel = (c: { re: number; im: number }) => ({ x: c.re * 10, y: -c.im * 10 });
    expect(nearestRoot(roots, toPixel, -49, -21, 5)).toBe(1);
    expect(nearestRoot(roots, toPixel, 100, 100, 5)).toBeNull();
  });
});
