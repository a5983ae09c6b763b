import { dampingFromOvershoot } from './damping-from-overshoot.js';
import { dropCollinear } from './drop-collinear.js';
import { regionBounds, type RegionBounds } from './region-bounds.js';
import type { Box, RadialBound } from './region-radial-interval.js';
import { regionSweep, type SweepPoint } from './region-sweep.js';
import { riseTimeNormalizedFast } from './rise-time-normalized-fast.js';
import type { Limits } from './tighten-limits.js';
import type { Complex, Requirements } from './types.js';

export interface RegionPolygon {
  half: 'upper' | 'lower';
  /** Closed: the last point repeats the first. */
  points: Complex[];
}

export interface RegionBoundaryLine {
  limit: keyof Limits;
  label: string;
  points: Complex[];
  /** The line forms part of the region's edge inside the viewport. */
  binding: boolean;
}

export interface RegionPlot {
  viewport: Box;
  polygons: RegionPolygon[];
  boundaries: RegionBoundaryLine[];
  marginApplied: boolean;
  feasible: boolean;
}

// The admissible region for plotting: closed polygons in (re, im) clipped to
// the viewport, the upper half from an angular sweep of the region and the
// lower half as the sweep of the mirrored viewport, mirrored back; plus every
// limit's boundary as labelled polylines clipped to the viewport (a limit may
// give several pieces: two lines for the peak time, a clipped circle).
// Accepts bounds from regionBounds or a requirement set (bounds made here).

const CURVE_POINTS = 240;

const BOUND_LIMIT: Partial<Record<RadialBound, keyof Limits>> = {
  decay: 'maxSettlingTime',
  dampedFrequency: 'maxPeakTime',
  riseTime: 'maxRiseTime',
  ceiling: 'maxNaturalFrequency',
};

function isBounds(x: RegionBounds | Requirements): x is RegionBounds {
  return 'riseTimeCurve' in x && 'limits' in x;
}

function fmt(x: number): string {
  return String(Number(x.toPrecision(3)));
}

function polar(r: number, theta: number, mirror: boolean): Complex {
  const im = r * Math.sin(theta);
  return { re: -r * Math.cos(theta), im: mirror ? -im : im };
}

function runPolygon(run: SweepPoint[], mirror: boolean): Complex[] {
  const raw = [...run.map((p) => polar(p.hi, p.theta, mirror)), ...run.map((p) => polar(p.lo, p.theta, mirror)).reverse()];
  const out: Complex[] = [];
  for (const p of raw) {
    const last = out[out.length - 1];
    if (last === undefined || last.re !== p.re || last.im !== p.im) out.push(p);
  }
  const lean = dropCollinear(out);
  const first = lean[0];
  if (first !== undefined) lean.push({ ...first });
  return lean;
}

// Liang-Barsky clipping of a polyline to the box; the inside parts are the pieces.
function clipPolyline(points: Complex[], box: Box): Complex[][] {
  const pieces: Complex[][] = [];
  let piece: Complex[] = [];
  const same = (a: Complex | undefined, b: Complex): boolean => a !== undefined && a.re === b.re && a.im === b.im;
  for (let i = 0; i + 1 < points.length; i++) {
    const a = points[i] as Complex;
    const b = points[i + 1] as Complex;
    const dx = b.re - a.re;
    const dy = b.im - a.im;
    let t0 = 0;
    let t1 = 1;
    const edges: [number, number][] = [
      [-dx, a.re - box.reMin],
      [dx, box.reMax - a.re],
      [-dy, a.im - box.imMin],
      [dy, box.imMax - a.im],
    ];
    let visible = true;
    for (const [p, q] of edges) {
      if (p === 0) {
        if (q < 0) visible = false;
      } else {
        const t = q / p;
        if (p < 0) t0 = Math.max(t0, t);
        else t1 = Math.min(t1, t);
      }
    }
    if (!visible || t0 > t1) {
      if (piece.length > 1) pieces.push(piece);
      piece = [];
      continue;
    }
    const pa = { re: a.re + t0 * dx, im: a.im + t0 * dy };
    const pb = { re: a.re + t1 * dx, im: a.im + t1 * dy };
    if (!same(piece[piece.length - 1], pa)) {
      if (piece.length > 1) pieces.push(piece);
      piece = [pa];
    }
    piece.push(pb);
    if (t1 < 1) {
      if (piece.length > 1) pieces.push(piece);
      piece = [];
    }
  }
  if (piece.length > 1) pieces.push(piece);
  return pieces;
}

// A curve given in polar form r(theta), drawn from the upper imaginary axis
// over the negative real axis to the lower one.
function polarCurve(r: (theta: number) => number): Complex[] {
  const upper: Complex[] = [];
  for (let k = CURVE_POINTS; k >= 0; k--) {
    const theta = ((Math.PI / 2) * k) / CURVE_POINTS;
    upper.push(polar(r(theta), theta, false));
  }
  const lower = upper.slice(0, -1).reverse().map((p) => ({ re: p.re, im: -p.im }));
  return [...upper, ...lower];
}

function marginNote(requested: number | undefined, b: RegionBounds, unit: string): string {
  if (!b.marginApplied || requested === undefined) return '';
  const word = unit === '' ? 'plus' : 'less';
  return ` (${fmt(requested)}${unit} ${word} ${fmt(b.marginPct)} % margin)`;
}

export function regionPolygons(input: RegionBounds | Requirements, viewport: Box): RegionPlot {
  const b = isBounds(input) ? input : regionBounds(input);
  const radial = {
    minDecayRate: b.minDecayRate,
    minDampedFrequency: b.minDampedFrequency,
    maxRiseTime: b.maxRiseTime,
    maxNaturalFrequency: b.maxNaturalFrequency,
  };
  const zetaMin = b.minDampingRatio;
  const empty = zetaMin !== null && zetaMin > 1;
  const thetaMax = zetaMin === null ? Math.PI / 2 : Math.acos(Math.min(zetaMin, 1));
  const mirrored: Box = { reMin: viewport.reMin, reMax: viewport.reMax, imMin: -viewport.imMax, imMax: -viewport.imMin };
  const upperRuns = empty ? [] : regionSweep(radial, thetaMax, viewport);
  const lowerRuns = empty ? [] : regionSweep(radial, thetaMax, mirrored);
  const polygons: RegionPolygon[] = [
    ...upperRuns.map((run) => ({ half: 'upper' as const, points: runPolygon(run, false) })),
    ...lowerRuns.map((run) => ({ half: 'lower' as const, points: runPolygon(run, true) })),
  ];

  const binding = new Set<keyof Limits>();
  for (const run of [...upperRuns, ...lowerRuns]) {
    for (const p of run) {
      const lo = BOUND_LIMIT[p.loBy];
      const hi = BOUND_LIMIT[p.hiBy];
      if (lo !== undefined) binding.add(lo);
      if (hi !== undefined) binding.add(hi);
    }
    const last = run[run.length - 1];
    if (zetaMin !== null && b.dampingFrom !== null && last !== undefined && Math.abs(last.theta - thetaMax) < 1e-12) {
      binding.add(b.dampingFrom);
    }
  }

  const far =
    2 * Math.max(Math.abs(viewport.reMin), Math.abs(viewport.reMax), Math.abs(viewport.imMin), Math.abs(viewport.imMax)) + 1;
  const lines: { limit: keyof Limits; label: string; points: Complex[] }[] = [];
  const lim = b.limits;
  const req = b.requestedLimits;
  const ray = (zeta: number): Complex[] => {
    const th = Math.acos(Math.min(Math.max(zeta, 0), 1));
    return [polar(far, th, false), { re: 0, im: 0 }, polar(far, th, true)];
  };
  if (lim.maxOvershootPct !== undefined) {
    const z = dampingFromOvershoot(lim.maxOvershootPct);
    lines.push({
      limit: 'maxOvershootPct',
      label: `zeta >= ${fmt(z)} from ${fmt(lim.maxOvershootPct)} % overshoot${marginNote(req.maxOvershootPct, b, ' %')}`,
      points: ray(z),
    });
  }
  if (lim.minDampingRatio !== undefined) {
    lines.push({
      limit: 'minDampingRatio',
      label: `zeta >= ${fmt(lim.minDampingRatio)} from the damping floor${marginNote(req.minDampingRatio, b, '')}`,
      points: ray(lim.minDampingRatio),
    });
  }
  if (lim.maxSettlingTime !== undefined && b.minDecayRate !== null) {
    lines.push({
      limit: 'maxSettlingTime',
      label: `sigma >= ${fmt(b.minDecayRate)} 1/s from ${fmt(lim.maxSettlingTime)} s settling time (${fmt(b.settlingBandPct)} % band)${marginNote(req.maxSettlingTime, b, ' s')}`,
      points: [
        { re: -b.minDecayRate, im: far },
        { re: -b.minDecayRate, im: -far },
      ],
    });
  }
  if (lim.maxPeakTime !== undefined && b.minDampedFrequency !== null) {
    const w = b.minDampedFrequency;
    const label = `omega_d >= ${fmt(w)} rad/s from ${fmt(lim.maxPeakTime)} s peak time${marginNote(req.maxPeakTime, b, ' s')}`;
    lines.push({ limit: 'maxPeakTime', label, points: [{ re: -far, im: w }, { re: 0, im: w }] });
    lines.push({ limit: 'maxPeakTime', label, points: [{ re: -far, im: -w }, { re: 0, im: -w }] });
  }
  if (lim.maxRiseTime !== undefined) {
    const tr = lim.maxRiseTime;
    lines.push({
      limit: 'maxRiseTime',
      label: `omega_n >= (normalized rise time at zeta) / ${fmt(tr)} s from ${fmt(tr)} s rise time (10-90 %)${marginNote(req.maxRiseTime, b, ' s')}`,
      points: polarCurve((th) => riseTimeNormalizedFast(Math.max(0, Math.cos(th))) / tr),
    });
  }
  if (lim.maxNaturalFrequency !== undefined) {
    const wn = lim.maxNaturalFrequency;
    lines.push({
      limit: 'maxNaturalFrequency',
      label: `omega_n <= ${fmt(wn)} rad/s, the natural-frequency ceiling${marginNote(req.maxNaturalFrequency, b, ' rad/s')}`,
      points: polarCurve(() => wn),
    });
  }

  const boundaries: RegionBoundaryLine[] = [];
  for (const line of lines) {
    for (const points of clipPolyline(line.points, viewport)) {
      boundaries.push({ limit: line.limit, label: line.label, points, binding: binding.has(line.limit) });
    }
  }
  return { viewport, polygons, boundaries, marginApplied: b.marginApplied, feasible: b.feasible };
}
