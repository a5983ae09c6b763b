import { scaleLinear } from 'd3-scale';

import { axisTicks, formatTick } from './axis-ticks.js';
import { formatCoordinate as f } from './format-coordinate.js';
import { formatValue } from './format-value.js';
import { labelWidth } from './label-width.js';
import { arrowPath, circlePath, crossPath, rectPath } from './mark-paths.js';
import { plotFrame } from './plot-frame.js';
import { polylinePath } from './polyline-path.js';
import { splaneViewport } from './splane-viewport.js';
import type { Axis, Complex, Frame, Label, Margin, Point, Viewport } from './types.js';

/** The engine's region plot (regionPolygons), or any object of the same shape. */
export interface RegionInput {
  viewport?: Viewport;
  polygons: readonly { points: readonly Complex[] }[];
  boundaries: readonly { limit: string; label: string; points: readonly Complex[]; binding?: boolean }[];
}

export interface SplanePlotInput {
  width: number;
  height: number;
  margin?: Partial<Margin>;
  /** The s-plane rectangle shown; defaults to the region's viewport, else one fitted to the poles. */
  viewport?: Viewport;
  region?: RegionInput | null;
  poles: readonly Complex[];
  zeros?: readonly Complex[];
  dominantPoles?: readonly Complex[];
  dominanceRatio?: number | null;
  /** Font size of the labels in the renderer (px or pt), for fitting them in the frame; 11 by default. */
  fontSize?: number;
  /** Size of a pole or zero mark in pixels (half the x's width, the o's radius). */
  markSize?: number;
}

export interface RootMark {
  re: number;
  im: number;
  x: number;
  y: number;
  d: string;
}

export interface OffPlotMark extends RootMark {
  kind: 'pole' | 'zero';
  label: Label;
}

export interface BoundaryPath {
  limit: string;
  /** The limit in words, e.g. "zeta >= 0.591 from 10 % overshoot". */
  label: string;
  /** 1, 2, ...: the number drawn at the anchor and listed beside the label in a key. */
  key: number;
  d: string;
  anchor: Point;
  binding: boolean;
}

export interface SplanePlot {
  width: number;
  height: number;
  frame: Frame;
  /** The frame's outline, to clip the region and the boundaries to. */
  framePath: string;
  viewport: Viewport;
  xDomain: [number, number];
  yDomain: [number, number];
  regionPaths: string[];
  boundaryPaths: BoundaryPath[];
  poleMarks: RootMark[];
  zeroMarks: RootMark[];
  dominantRings: RootMark[];
  offPlot: OffPlotMark[];
  dominanceLine: { re: number; x: number; d: string; label: Label } | null;
  realAxisPath: string | null;
  imaginaryAxisPath: string | null;
  gridPath: string;
  xAxis: Axis;
  yAxis: Axis;
}

function inside(p: Point, frame: Frame, inset = 0): boolean {
  return p.x >= frame.x + inset && p.x <= frame.x + frame.width - inset && p.y >= frame.y + inset && p.y <= frame.y + frame.height - inset;
}

// Labels are keyed numbers on the boundaries; each anchor is the point of its
// boundary that is farthest from anchors already placed, from the marks and
// from the frame's edge, so the numbers stay apart and readable.
function placeAnchors(groups: Point[][], avoid: Point[], frame: Frame): Point[] {
  const placed: Point[] = [];
  const out: Point[] = [];
  for (const pts of groups) {
    let best: Point | null = null;
    let bestScore = -Infinity;
    for (const p of pts) {
      if (!inside(p, frame, 10)) continue;
      const edge = Math.min(p.x - frame.x, frame.x + frame.width - p.x, p.y - frame.y, frame.y + frame.height - p.y);
      let near = Infinity;
      for (const q of [...placed, ...avoid]) near = Math.min(near, Math.hypot(p.x - q.x, p.y - q.y));
      const score = Math.min(near, 60) + Math.min(edge, 30) * 0.5;
      if (score > bestScore) {
        bestScore = score;
        best = p;
      }
    }
    const chosen = best ?? pts[Math.floor(pts.length / 2)] ?? { x: frame.x, y: frame.y };
    placed.push(chosen);
    out.push({ x: Math.round(chosen.x * 100) / 100, y: Math.round(chosen.y * 100) / 100 });
  }
  return out;
}

// Points along a pixel polyline every `spacing` pixels, for anchor candidates.
function resample(points: Point[], spacing: number): Point[] {
  const out: Point[] = [];
  for (let i = 0; i + 1 < points.length; i++) {
    const a = points[i]!;
    const b = points[i + 1]!;
    const n = Math.max(1, Math.ceil(Math.hypot(b.x - a.x, b.y - a.y) / spacing));
    for (let k = 0; k < n; k++) out.push({ x: a.x + ((b.x - a.x) * k) / n, y: a.y + ((b.y - a.y) * k) / n });
  }
  const last = points[points.length - 1];
  if (last) out.push(last);
  return out;
}

// To the right of the threshold line, or to its left when the frame's right
// edge would cut it there (label-width.ts).
function thresholdLabel(lx: number, frame: { x: number; y: number; width: number }, text: string, fontSize: number): Label {
  const width = labelWidth(text, fontSize);
  const fitsRight = lx + 4 + width <= frame.x + frame.width;
  const fitsLeft = lx - 4 - width >= frame.x;
  return !fitsRight && fitsLeft
    ? { x: lx - 4, y: frame.y + 4, text, anchor: 'end', baseline: 'top' }
    : { x: lx + 4, y: frame.y + 4, text, anchor: 'start', baseline: 'top' };
}

/**
 * The s-plane plot as pixel geometry for a width x height box: the shaded
 * admissible region, each limit's boundary with a keyed label anchor, poles
 * as x and zeros as o, a ring on each dominant pole, the dominance threshold
 * (ratio times the dominant real part) as a vertical line, grid and ticks.
 * Real part to the right, imaginary part up; pixels grow right and down.
 */
export function splanePlot(input: SplanePlotInput): SplanePlot {
  const { width, height } = input;
  const frame = plotFrame(width, height, input.margin);
  const zeros = input.zeros ?? [];
  const dominant = input.dominantPoles ?? [];
  const viewport =
    input.viewport ??
    input.region?.viewport ??
    splaneViewport({ poles: input.poles, zeros, dominantPoles: dominant, dominanceRatio: input.dominanceRatio ?? null, width: frame.width, height: frame.height });
  const x = scaleLinear().domain([viewport.reMin, viewport.reMax]).range([frame.x, frame.x + frame.width]);
  const y = scaleLinear().domain([viewport.imMin, viewport.imMax]).range([frame.y + frame.height, frame.y]);
  const px = (c: Complex): Point => ({ x: x(c.re), y: y(c.im) });
  const mark = input.markSize ?? 5;

  const regionPaths = (input.region?.polygons ?? []).map((poly) => polylinePath(poly.points.map(px), true)).filter((d) => d !== '');

  // One path and one label per limit (the peak-time limit has two lines, a clipped circle several pieces).
  const groups = new Map<string, { limit: string; label: string; pieces: Point[][]; binding: boolean }>();
  for (const b of input.region?.boundaries ?? []) {
    const key = `${b.limit}\u0000${b.label}`;
    const g = groups.get(key) ?? { limit: b.limit, label: b.label, pieces: [], binding: false };
    g.pieces.push(b.points.map(px));
    g.binding ||= b.binding ?? true;
    groups.set(key, g);
  }
  const groupList = [...groups.values()];

  const inView = (c: Complex) => c.re >= viewport.reMin && c.re <= viewport.reMax && c.im >= viewport.imMin && c.im <= viewport.imMax;
  const toMark = (c: Complex, d: (p: Point) => string): RootMark => {
    const p = px(c);
    return { re: c.re, im: c.im, x: Math.round(p.x * 100) / 100, y: Math.round(p.y * 100) / 100, d: d(p) };
  };
  const poleMarks = input.poles.filter(inView).map((c) => toMark(c, (p) => crossPath(p.x, p.y, mark)));
  const zeroMarks = zeros.filter(inView).map((c) => toMark(c, (p) => circlePath(p.x, p.y, mark)));
  const dominantRings = dominant.filter(inView).map((c) => toMark(c, (p) => circlePath(p.x, p.y, mark * 2.2)));

  // Roots outside the view: a triangle on the nearest edge pointing their way, with the value.
  const offPlot: OffPlotMark[] = [];
  const offRoots = [
    ...input.poles.filter((c) => !inView(c)).map((c) => ({ c, kind: 'pole' as const })),
    ...zeros.filter((c) => !inView(c)).map((c) => ({ c, kind: 'zero' as const })),
  ];
  offRoots.forEach(({ c, kind }, i) => {
    const p = px(c);
    const cx = Math.min(Math.max(p.x, frame.x), frame.x + frame.width);
    const cy = Math.min(Math.max(p.y, frame.y), frame.y + frame.height);
    const dir = p.x < frame.x ? 'left' : p.x > frame.x + frame.width ? 'right' : p.y < frame.y ? 'up' : 'down';
    const ay = dir === 'left' || dir === 'right' ? Math.min(Math.max(cy, frame.y + mark), frame.y + frame.height - mark) : cy;
    const ax = dir === 'up' || dir === 'down' ? Math.min(Math.max(cx, frame.x + mark), frame.x + frame.width - mark) : cx;
    const value = c.im === 0 ? formatValue(c.re) : `${formatValue(c.re)} ${c.im < 0 ? '-' : '+'} j${formatValue(Math.abs(c.im))}`;
    offPlot.push({
      kind,
      re: c.re,
      im: c.im,
      x: Math.round(ax * 100) / 100,
      y: Math.round(ay * 100) / 100,
      d: arrowPath(ax, ay, mark * 0.9, dir),
      label: {
        x: dir === 'left' ? ax + mark * 2 : ax - mark * 2,
        y: ay - mark - 2 - 11 * i,
        text: `${kind} at ${value} (off plot)`,
        anchor: dir === 'left' ? 'start' : 'end',
        baseline: 'bottom',
      },
    });
  });

  let dominanceLine: SplanePlot['dominanceLine'] = null;
  const ratio = input.dominanceRatio ?? null;
  const domRe = dominant.length > 0 ? Math.min(...dominant.map((p) => p.re)) : null;
  if (ratio !== null && ratio > 0 && domRe !== null && domRe < 0) {
    const re = ratio * domRe;
    if (re >= viewport.reMin && re <= viewport.reMax) {
      const lx = x(re);
      dominanceLine = {
        re,
        x: Math.round(lx * 100) / 100,
        d: `M${f(lx)},${f(frame.y)}L${f(lx)},${f(frame.y + frame.height)}`,
        label: thresholdLabel(lx, frame, `dominance threshold ${formatValue(ratio)} x ${formatValue(domRe)} = ${formatValue(re)} 1/s`, input.fontSize ?? 11),
      };
    }
  }

  const avoid: Point[] = [...poleMarks, ...zeroMarks, ...(dominanceLine ? [dominanceLine.label] : [])];
  const anchors = placeAnchors(
    groupList.map((g) => g.pieces.flatMap((piece) => resample(piece, 8))),
    avoid,
    frame,
  );
  const boundaryPaths: BoundaryPath[] = groupList.map((g, i) => ({
    limit: g.limit,
    label: g.label,
    key: i + 1,
    d: g.pieces.map((piece) => polylinePath(piece)).join(''),
    anchor: anchors[i]!,
    binding: g.binding,
  }));

  const xt = axisTicks(viewport.reMin, viewport.reMax, Math.max(2, Math.round(frame.width / 70)));
  const yt = axisTicks(viewport.imMin, viewport.imMax, Math.max(2, Math.round(frame.height / 45)));
  const xAxis: Axis = {
    step: xt.step,
    ticks: xt.values.map((v) => ({ value: v, position: Math.round(x(v) * 100) / 100, label: formatTick(v, xt.decimals) })),
    title: { x: frame.x + frame.width / 2, y: height - 4, text: 'Real part (1/s)', anchor: 'middle', baseline: 'bottom' },
  };
  const yAxis: Axis = {
    step: yt.step,
    ticks: yt.values.map((v) => ({ value: v, position: Math.round(y(v) * 100) / 100, label: formatTick(v, yt.decimals) })),
    title: { x: 10, y: frame.y + frame.height / 2, text: 'Imaginary part (rad/s)', anchor: 'middle', baseline: 'top', rotate: -90 },
  };
  const grid = [
    ...xAxis.ticks.map((t) => `M${f(t.position)},${f(frame.y)}L${f(t.position)},${f(frame.y + frame.height)}`),
    ...yAxis.ticks.map((t) => `M${f(frame.x)},${f(t.position)}L${f(frame.x + frame.width)},${f(t.position)}`),
  ].join('');

  const realAxisPath = 0 >= viewport.imMin && 0 <= viewport.imMax ? `M${f(frame.x)},${f(y(0))}L${f(frame.x + frame.width)},${f(y(0))}` : null;
  const imaginaryAxisPath = 0 >= viewport.reMin && 0 <= viewport.reMax ? `M${f(x(0))},${f(frame.y)}L${f(x(0))},${f(frame.y + frame.height)}` : null;

  return {
    width,
    height,
    frame,
    framePath: rectPath(frame.x, frame.y, frame.width, frame.height),
    viewport,
    xDomain: [viewport.reMin, viewport.reMax],
    yDomain: [viewport.imMin, viewport.imMax],
    regionPaths,
    boundaryPaths,
    poleMarks,
    zeroMarks,
    dominantRings,
    offPlot,
    dominanceLine,
    realAxisPath,
    imaginaryAxisPath,
    gridPath: grid,
    xAxis,
    yAxis,
  };
}
