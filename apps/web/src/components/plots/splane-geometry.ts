// Pixel geometry of the s-plane plot for one view: @polecourt/plots does the axes, grid,
// region, boundaries, label anchors and the dominance line; this adapter adds the pole and
// zero marks as ONE combined path each. (splanePlot places its label anchors clear of every
// mark, which is quadratic and takes about a second for 10,000 poles; here it only sees the
// few marks that matter for labels, and the marks themselves are plain string building.)
import {
  type Complex,
  type Margin,
  type RegionInput,
  type SplanePlot,
  type Viewport,
  circlePath,
  crossPath,
  splanePlot,
  splaneViewport,
} from '@polecourt/plots';
import { scaleLinear } from 'd3-scale';

/** Up to this many roots, splanePlot gets them all (edge marks for roots outside the view, labels kept clear of them). */
export const FULL_DETAIL_LIMIT = 200;

export const SPLANE_MARGIN: Margin = { top: 12, right: 14, bottom: 44, left: 56 };

export interface SplaneGeometryInput {
  width: number;
  height: number;
  view: Viewport;
  region: RegionInput | null;
  poles: readonly Complex[];
  zeros: readonly Complex[];
  dominantPoles: readonly Complex[];
  dominanceRatio: number | null;
  markSize: number;
  /** Give the marks as pixel centres (polePoints, zeroPoints) instead of paths, for a canvas. */
  asPoints?: boolean;
}

export interface SplaneGeometry {
  plot: SplanePlot;
  /** Every pole inside the view as one path of x marks. */
  polePath: string;
  /** How many marks the pole and zero paths hold. */
  markCount: number;
  zeroPath: string;
  /** With asPoints: the centres of the marks inside the view, as x, y pairs in CSS pixels (the paths are then empty). */
  polePoints: Float64Array;
  zeroPoints: Float64Array;
  ringPath: string;
  /** Roots outside the view that have no edge mark of their own (only counted, for large sets). */
  hiddenPoles: number;
  hiddenZeros: number;
  /** Maps between the s-plane and pixels for this view. */
  toPixel: (c: Complex) => { x: number; y: number };
  toPlane: (x: number, y: number) => Complex;
}

function inView(c: Complex, v: Viewport): boolean {
  return c.re >= v.reMin && c.re <= v.reMax && c.im >= v.imMin && c.im <= v.imMax;
}

export function splaneGeometry(input: SplaneGeometryInput): SplaneGeometry {
  const { width, height, view, poles, zeros, dominantPoles, markSize } = input;
  const full = poles.length + zeros.length <= FULL_DETAIL_LIMIT;
  const plot = splanePlot({
    width,
    height,
    margin: SPLANE_MARGIN,
    viewport: view,
    region: input.region,
    poles: full ? poles : dominantPoles,
    zeros: full ? zeros : [],
    dominantPoles,
    dominanceRatio: input.dominanceRatio,
    markSize,
  });
  const { frame } = plot;
  const x = scaleLinear().domain([view.reMin, view.reMax]).range([frame.x, frame.x + frame.width]);
  const y = scaleLinear().domain([view.imMin, view.imMax]).range([frame.y + frame.height, frame.y]);

  // One string per kind of mark: the browser parses one long path far faster than it lays out 10,000 elements.
  // For a canvas only the centres are needed, which skips building the strings altogether.
  const points = input.asPoints === true;
  const marks = (roots: readonly Complex[], path: (px: number, py: number, r: number) => string) => {
    const parts: string[] = [];
    const centres: number[] = [];
    let hidden = 0;
    for (const c of roots) {
      if (!inView(c, view)) hidden++;
      else if (points) centres.push(x(c.re), y(c.im));
      else parts.push(path(x(c.re), y(c.im), markSize));
    }
    return { path: parts.join(''), points: Float64Array.from(centres), count: points ? centres.length / 2 : parts.length, hidden };
  };
  const poleMarks = marks(poles, crossPath);
  const zeroMarks = marks(zeros, circlePath);
  const hiddenPoles = poleMarks.hidden;
  const hiddenZeros = zeroMarks.hidden;
  return {
    plot,
    polePath: poleMarks.path,
    markCount: poleMarks.count + zeroMarks.count,
    zeroPath: zeroMarks.path,
    polePoints: poleMarks.points,
    zeroPoints: zeroMarks.points,
    ringPath: plot.dominantRings.map((r) => r.d).join(''),
    // With full detail every outside root already has its edge mark.
    hiddenPoles: full ? 0 : hiddenPoles,
    hiddenZeros: full ? 0 : hiddenZeros,
    toPixel: (c) => ({ x: x(c.re), y: y(c.im) }),
    toPlane: (px, py) => ({ re: x.invert(px), im: y.invert(py) }),
  };
}

/** Features of the admissible region worth keeping in view when the plot picks its own window. */
export interface RegionFocus {
  minDecayRate?: number | null;
  minDampedFrequency?: number | null;
  maxNaturalFrequency?: number | null;
}

/**
 * The first view: the region's lines, the origin and the poles near the action, at one scale on
 * both axes (so damping rays show their true angle). Large pole sets are summarised by their
 * extremes so the fitting stays cheap.
 */
export function defaultView(input: {
  width: number;
  height: number;
  poles: readonly Complex[];
  zeros: readonly Complex[];
  dominantPoles: readonly Complex[];
  dominanceRatio: number | null;
  region: RegionFocus | null;
}): Viewport {
  const frameW = Math.max(1, input.width - SPLANE_MARGIN.left - SPLANE_MARGIN.right);
  const frameH = Math.max(1, input.height - SPLANE_MARGIN.top - SPLANE_MARGIN.bottom);
  const roots = [...input.poles, ...input.zeros];
  const sample = roots.length <= FULL_DETAIL_LIMIT ? roots : extremes(roots);
  const hasRegion = input.region && Object.values(input.region).some((v) => typeof v === 'number' && v > 0);
  if (sample.length === 0 && input.dominantPoles.length === 0 && !hasRegion) {
    return { reMin: -10, reMax: 2, imMin: -6, imMax: 6 };
  }
  return splaneViewport({
    poles: sample,
    dominantPoles: input.dominantPoles,
    dominanceRatio: input.dominanceRatio,
    region: input.region,
    width: frameW,
    height: frameH,
  });
}

// The leftmost, rightmost, highest and lowest roots: enough to fit a window around a large set.
function extremes(roots: readonly Complex[]): Complex[] {
  let a = roots[0]!;
  let b = a;
  let c = a;
  let d = a;
  for (const r of roots) {
    if (r.re < a.re) a = r;
    if (r.re > b.re) b = r;
    if (r.im > c.im) c = r;
    if (r.im < d.im) d = r;
  }
  return [a, b, c, d];
}

/** The view scaled by `factor` (below 1 zooms in) about the s-plane point `at`. */
export function zoomView(view: Viewport, factor: number, at: Complex): Viewport {
  return {
    reMin: at.re + (view.reMin - at.re) * factor,
    reMax: at.re + (view.reMax - at.re) * factor,
    imMin: at.im + (view.imMin - at.im) * factor,
    imMax: at.im + (view.imMax - at.im) * factor,
  };
}

/** The view moved by (dRe, dIm) in s-plane units. */
export function panView(view: Viewport, dRe: number, dIm: number): Viewport {
  return { reMin: view.reMin + dRe, reMax: view.reMax + dRe, imMin: view.imMin + dIm, imMax: view.imMax + dIm };
}

export function viewCentre(view: Viewport): Complex {
  return { re: (view.reMin + view.reMax) / 2, im: (view.imMin + view.imMax) / 2 };
}

/** Index of the root nearest to pixel (px, py) within `radius` pixels, or null. Linear: 10,000 roots take well under a millisecond. */
export function nearestRoot(roots: readonly Complex[], toPixel: (c: Complex) => { x: number; y: number }, px: number, py: number, radius: number): number | null {
  let best: number | null = null;
  let bestD = radius * radius;
  for (let i = 0; i < roots.length; i++) {
    const p = toPixel(roots[i]!);
    const d = (p.x - px) ** 2 + (p.y - py) ** 2;
    if (d <= bestD) {
      bestD = d;
      best = i;
    }
  }
  return best;
}
