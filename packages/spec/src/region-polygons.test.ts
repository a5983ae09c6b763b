import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { assertClose } from '../test/asserts.js';
import { requirementsArb } from '../test/requirement-arbitraries.js';
import { regionBounds } from './region-bounds.js';
import { regionPolygons } from './region-polygons.js';
import { regionSlack } from './region-slack.js';
import type { Complex } from './types.js';

function insidePolygon(p: Complex, poly: Complex[]): boolean {
  let inside = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const a = poly[i] as Complex;
    const b = poly[j] as Complex;
    if (a.im > p.im !== b.im > p.im && p.re < ((b.re - a.re) * (p.im - a.im)) / (b.im - a.im) + a.re) inside = !inside;
  }
  return inside;
}

function distanceToEdges(p: Complex, poly: Complex[]): number {
  let best = Number.POSITIVE_INFINITY;
  for (let i = 0; i + 1 < poly.length; i++) {
    const a = poly[i] as Complex;
    const b = poly[i + 1] as Complex;
    const dx = b.re - a.re;
    const dy = b.im - a.im;
    const len2 = dx * dx + dy * dy;
    const t = len2 > 0 ? Math.max(0, Math.min(1, ((p.re - a.re) * dx + (p.im - a.im) * dy) / len2)) : 0;
    best = Math.min(best, Math.hypot(p.re - a.re - t * dx, p.im - a.im - t * dy));
  }
  return best;
}

const viewport = { reMin: -30, reMax: 5, imMin: -25, imMax: 25 };

describe('regionPolygons', () => {
  it('gives closed polygons inside the viewport whose inside is exactly where regionSlack says inside (property test)', () => {
    fc.assert(
      fc.property(
        requirementsArb,
        fc.array(fc.record({ re: fc.double({ min: -30, max: 5, noNaN: true }), im: fc.double({ min: -25, max: 25, noNaN: true }) }), {
          minLength: 200,
          maxLength: 200,
        }),
        (req, points) => {
          const plot = regionPolygons(req, viewport);
          const size = 55;
          for (const { points: poly } of plot.polygons) {
            expect(poly.length).toBeGreaterThanOrEqual(3);
            expect(poly[0]).toEqual(poly[poly.length - 1]);
            for (const v of poly) {
              expect(v.re).toBeGreaterThanOrEqual(viewport.reMin - 1e-9 * size);
              expect(v.re).toBeLessThanOrEqual(viewport.reMax + 1e-9 * size);
              expect(v.im).toBeGreaterThanOrEqual(viewport.imMin - 1e-9 * size);
              expect(v.im).toBeLessThanOrEqual(viewport.imMax + 1e-9 * size);
            }
          }
          for (const p of points) {
            const near = plot.polygons.some((poly) => distanceToEdges(p, poly.points) < 1e-3 * size);
            if (near || p.im === 0) continue;
            const inPoly = plot.polygons.some((poly) => insidePolygon(p, poly.points));
            expect(inPoly, `point ${JSON.stringify(p)} for ${JSON.stringify(req)}`).toBe(regionSlack(p, req).inside);
          }
        },
      ),
      { numRuns: 150 },
    );
  }, 120_000);

  it('is symmetric about the real axis in a symmetric viewport', () => {
    const plot = regionPolygons({ maxOvershootPct: 10, maxSettlingTime: 1, maxPeakTime: 0.5 }, viewport);
    const upper = plot.polygons.filter((p) => p.half === 'upper');
    const lower = plot.polygons.filter((p) => p.half === 'lower');
    expect(upper.length).toBe(1);
    expect(lower.length).toBe(1);
    const u = upper[0]?.points ?? [];
    const l = lower[0]?.points ?? [];
    expect(l.length).toBe(u.length);
    u.forEach((p, i) => {
      assertClose(l[i]?.re, p.re, 1e-12, 1);
      assertClose(l[i]?.im, -p.im, 1e-12, 1);
    });
  });

  it('keeps the corner where the decay line meets the damping ray (zeta 0.591 from 10 %, sigma 4)', () => {
    const plot = regionPolygons({ maxOvershootPct: 10, maxSettlingTime: 1 }, viewport);
    const upper = plot.polygons.find((p) => p.half === 'upper')?.points ?? [];
    // On the ray zeta = 0.5912 the decay line sigma = 4 sits at omega_d = 4 tan(acos 0.5912).
    const zeta = regionBounds({ maxOvershootPct: 10 }).minDampingRatio ?? 0;
    const corner = { re: -4, im: (4 * Math.sqrt(1 - zeta * zeta)) / zeta };
    const d = Math.min(...upper.map((v) => Math.hypot(v.re - corner.re, v.im - corner.im)));
    expect(d).toBeLessThan(1e-9);
  });

  it('labels each boundary with the limit that makes it', () => {
    const plot = regionPolygons(
      { maxOvershootPct: 10, maxSettlingTime: 1.2, maxPeakTime: 0.6, maxRiseTime: 0.3, minDampingRatio: 0.5, maxNaturalFrequency: 20 },
      viewport,
    );
    const labels = new Map(plot.boundaries.map((b) => [b.limit, b.label]));
    expect(labels.get('maxOvershootPct')).toBe('zeta >= 0.591 from 10 % overshoot');
    expect(labels.get('minDampingRatio')).toBe('zeta >= 0.5 from the damping floor');
    expect(labels.get('maxSettlingTime')).toBe('sigma >= 3.33 1/s from 1.2 s settling time (2 % band)');
    expect(labels.get('maxPeakTime')).toBe('omega_d >= 5.24 rad/s from 0.6 s peak time');
    expect(labels.get('maxRiseTime')).toMatch(/from 0.3 s rise time \(10-90 %\)/);
    expect(labels.get('maxNaturalFrequency')).toMatch(/^omega_n <= 20 rad\/s/);
    expect(plot.boundaries.filter((b) => b.limit === 'maxPeakTime').length).toBe(2);
    // the overshoot ray is stricter than the floor, so only it makes the region's edge
    expect(plot.boundaries.find((b) => b.limit === 'maxOvershootPct')?.binding).toBe(true);
    expect(plot.boundaries.find((b) => b.limit === 'minDampingRatio')?.binding).toBe(false);
    for (const b of plot.boundaries) {
      for (const p of b.points) {
        expect(p.re).toBeGreaterThanOrEqual(viewport.reMin - 1e-9);
        expect(p.re).toBeLessThanOrEqual(viewport.reMax + 1e-9);
        expect(p.im).toBeGreaterThanOrEqual(viewport.imMin - 1e-9);
        expect(p.im).toBeLessThanOrEqual(viewport.imMax + 1e-9);
      }
    }
  });

  it('puts the rise-time boundary on omega_n = f(zeta) / Tr: a curve, not a circle', () => {
    const plot = regionPolygons({ maxRiseTime: 0.3 }, viewport);
    const curve = plot.boundaries.find((b) => b.limit === 'maxRiseTime');
    const radii = (curve?.points ?? []).map((p) => Math.hypot(p.re, p.im));
    // Nise ch. 4 (from memory): omega_n Tr ≈ 1.10 at zeta 0.1 ... ≈ 3.36 near zeta 1
    expect(Math.max(...radii) / Math.min(...radii)).toBeGreaterThan(3);
    for (const p of curve?.points ?? []) {
      if (p.re < 0) assertClose(regionSlack(p, { maxRiseTime: 0.3 }).slack.maxRiseTime, 0, 1e-9, 1);
    }
  });

  it('says when the margin tightened the drawn region, in the labels too', () => {
    const plot = regionPolygons({ maxSettlingTime: 1, marginPct: 10 }, viewport);
    expect(plot.marginApplied).toBe(true);
    expect(plot.boundaries[0]?.label).toBe('sigma >= 4.44 1/s from 0.9 s settling time (2 % band) (1 s less 10 % margin)');
  });

  it('gives no polygon for an empty region or a viewport that misses it', () => {
    expect(regionPolygons({ maxSettlingTime: 0.1, maxNaturalFrequency: 20 }, viewport).polygons).toEqual([]);
    expect(regionPolygons({ maxSettlingTime: 1 }, { reMin: 0, reMax: 5, imMin: -5, imMax: 5 }).polygons).toEqual([]);
  });

  it('accepts the bounds of regionBounds as well as the requirement set', () => {
    const req = { maxOvershootPct: 20, maxNaturalFrequency: 10 };
    expect(regionPolygons(regionBounds(req), viewport)).toEqual(regionPolygons(req, viewport));
  });
});
