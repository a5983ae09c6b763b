import { scaleLinear } from 'd3-scale';

import { axisTicks, formatTick } from './axis-ticks.js';
import { formatCoordinate as f } from './format-coordinate.js';
import { formatValue } from './format-value.js';
import { labelWidth } from './label-width.js';
import { rectPath } from './mark-paths.js';
import { plotFrame } from './plot-frame.js';
import { polylinePath } from './polyline-path.js';
import type { Axis, Frame, Label, Margin, SampledPoint } from './types.js';

export interface StepPlotInput {
  width: number;
  height: number;
  margin?: Partial<Margin>;
  /** The exact step response, sampled densely enough to draw (t ascending, seconds). */
  samples: readonly SampledPoint[];
  /** y_f = G(0); null when the response has no final value (unstable) or it is zero. */
  finalValue: number | null;
  settlingBandPct?: number | null;
  /** The overshoot limit in percent: drawn as a ceiling at y_f (1 + limit/100). */
  maxOvershootPct?: number | null;
  maxPeakTime?: number | null;
  maxSettlingTime?: number | null;
  /** The 10-90 % rise-time limit: drawn as a span starting where the response first crosses 10 %. */
  maxRiseTime?: number | null;
  /** Font size the labels will be drawn at, for keeping them apart. */
  fontSize?: number;
}

export interface Guide {
  kind: 'peak' | 'settling' | 'rise' | 'ceiling';
  value: number;
  d: string;
  label: Label;
}

export interface StepPlot {
  width: number;
  height: number;
  frame: Frame;
  framePath: string;
  xDomain: [number, number];
  yDomain: [number, number];
  responsePath: string;
  finalValuePath: string | null;
  /** The settling band as a closed rectangle (shaded) and its two edges (stroked). */
  bandPath: string | null;
  bandEdgesPath: string | null;
  bandLabel: Label | null;
  guides: Guide[];
  gridPath: string;
  xAxis: Axis;
  yAxis: Axis;
}

// First time the samples cross `level` going towards the final value, by linear interpolation.
function firstCrossing(samples: readonly SampledPoint[], level: number, sign: number): number | null {
  const first = samples[0];
  if (first && sign * (first.y - level) >= 0) return first.t;
  for (let i = 0; i + 1 < samples.length; i++) {
    const a = samples[i]!;
    const b = samples[i + 1]!;
    const da = sign * (a.y - level);
    const db = sign * (b.y - level);
    if (da < 0 && db >= 0) return a.t + ((b.t - a.t) * -da) / (db - da);
  }
  return null;
}

/**
 * The step-response plot as pixel geometry: the response line (d3-shape), the
 * final value, the settling band (y_f times 1 +- band/100), the overshoot
 * ceiling and the time limits as labelled guides, grid and round ticks.
 */
export function stepPlot(input: StepPlotInput): StepPlot {
  const { width, height } = input;
  const frame = plotFrame(width, height, input.margin);
  const fontSize = input.fontSize ?? 10;
  const samples = input.samples.filter((s) => Number.isFinite(s.t) && Number.isFinite(s.y));
  const yf = input.finalValue !== null && Number.isFinite(input.finalValue) && input.finalValue !== 0 ? input.finalValue : null;
  const band = input.settlingBandPct ?? null;
  const ceiling = yf !== null && input.maxOvershootPct != null ? yf * (1 + input.maxOvershootPct / 100) : null;

  const tLast = samples.length > 0 ? samples[samples.length - 1]!.t : 1;
  const timeLimits = [input.maxPeakTime, input.maxSettlingTime].filter((v): v is number => v != null && v > 0);
  const tMax = Math.max(tLast, ...timeLimits.map((t) => t * 1.15), 1e-9);

  const ys = samples.map((s) => s.y);
  const levels = [0, ...ys];
  if (yf !== null) levels.push(yf);
  if (ceiling !== null) levels.push(ceiling);
  if (yf !== null && band !== null) levels.push(yf * (1 + band / 100), yf * (1 - band / 100));
  let yMin = Math.min(...levels);
  let yMax = Math.max(...levels);
  const span = Math.max(yMax - yMin, 1e-9);
  // Headroom above for the guide labels; a little below the lowest level.
  yMax += span * 0.14;
  yMin -= span * 0.04;

  const x = scaleLinear().domain([0, tMax]).range([frame.x, frame.x + frame.width]);
  const y = scaleLinear().domain([yMin, yMax]).range([frame.y + frame.height, frame.y]);
  const X = (t: number) => x(t);
  const Y = (v: number) => y(v);
  const left = frame.x;
  const right = frame.x + frame.width;
  const hline = (v: number, from = left, to = right) => `M${f(from)},${f(Y(v))}L${f(to)},${f(Y(v))}`;
  const vline = (t: number) => `M${f(X(t))},${f(frame.y)}L${f(X(t))},${f(frame.y + frame.height)}`;

  const responsePath = polylinePath(samples.map((s) => ({ x: X(s.t), y: Y(s.y) })));
  const finalValuePath = yf !== null ? hline(yf) : null;

  let bandPath: string | null = null;
  let bandEdgesPath: string | null = null;
  let bandLabel: Label | null = null;
  if (yf !== null && band !== null && band > 0) {
    const hi = yf * (1 + band / 100);
    const lo = yf * (1 - band / 100);
    const top = Math.min(Y(hi), Y(lo));
    const bottom = Math.max(Y(hi), Y(lo));
    bandPath = rectPath(left, top, frame.width, bottom - top);
    bandEdgesPath = hline(hi) + hline(lo);
    bandLabel = { x: right - 4, y: bottom + 2, text: `settling band ±${formatValue(band)} %`, anchor: 'end', baseline: 'top' };
  }

  const guides: Guide[] = [];
  if (ceiling !== null && input.maxOvershootPct != null) {
    guides.push({
      kind: 'ceiling',
      value: ceiling,
      d: hline(ceiling),
      // At the left end, where the response has not risen yet and no time guide stands.
      label: { x: left + 4, y: Y(ceiling) - 2, text: `overshoot ceiling ${formatValue(input.maxOvershootPct)} % (y = ${formatValue(ceiling)})`, anchor: 'start', baseline: 'bottom' },
    });
  }
  // Vertical guides get their labels along the bottom of the frame (where a
  // step response has long left by the time limits), stepped up when two would touch.
  const verticals: { kind: 'peak' | 'settling'; value: number; text: string }[] = [];
  if (input.maxPeakTime != null && input.maxPeakTime > 0) verticals.push({ kind: 'peak', value: input.maxPeakTime, text: `peak-time limit ${formatValue(input.maxPeakTime)} s` });
  if (input.maxSettlingTime != null && input.maxSettlingTime > 0) verticals.push({ kind: 'settling', value: input.maxSettlingTime, text: `settling-time limit ${formatValue(input.maxSettlingTime)} s` });
  verticals.sort((a, b) => a.value - b.value);
  let lastEnd = -Infinity;
  let row = 0;
  for (const v of verticals) {
    const gx = X(v.value);
    const textWidth = labelWidth(v.text, fontSize);
    const flip = gx + 4 + textWidth > right; // near the right edge the text goes to the line's left
    const start = flip ? gx - 4 - textWidth : gx + 4;
    row = start < lastEnd + 6 ? row + 1 : 0;
    lastEnd = start + textWidth;
    guides.push({
      kind: v.kind,
      value: v.value,
      d: vline(v.value),
      label: { x: flip ? gx - 4 : gx + 4, y: frame.y + frame.height - 3 - row * (fontSize + 3), text: v.text, anchor: flip ? 'end' : 'start', baseline: 'bottom' },
    });
  }
  if (yf !== null && input.maxRiseTime != null && input.maxRiseTime > 0) {
    const sign = Math.sign(yf);
    const t10 = firstCrossing(samples, 0.1 * yf, sign);
    if (t10 !== null) {
      const t90 = t10 + input.maxRiseTime;
      // Drawn at half the final value: after the span the response of a design that meets
      // the limit is above 90 %, so the label to the right of the span stays clear of it.
      const gy = Y(0.5 * yf);
      const a = X(t10);
      const b = X(Math.min(t90, tMax));
      const d = `M${f(a)},${f(gy)}L${f(b)},${f(gy)}M${f(a)},${f(gy - 4)}L${f(a)},${f(gy + 4)}M${f(b)},${f(gy - 4)}L${f(b)},${f(gy + 4)}`;
      const text = `rise-time limit ${formatValue(input.maxRiseTime)} s (10-90 %)`;
      const width = labelWidth(text, fontSize);
      // Right of the span, left of it, or right of a vertical guide (peak or
      // settling line) past the span: the first place with room that no
      // vertical guide crosses, else the first place with room.
      const lines = guides.filter((g) => g.kind === 'peak' || g.kind === 'settling').map((g) => X(g.value));
      const startAt = (x0: number) => ({ label: { x: x0, y: gy, text, anchor: 'start', baseline: 'middle' } as Label, from: x0, to: x0 + width });
      const leftOfSpan = { label: { x: a - 5, y: gy, text, anchor: 'end', baseline: 'middle' } as Label, from: a - 5 - width, to: a - 5 };
      const sides = [startAt(b + 5), leftOfSpan, ...lines.filter((gx) => gx > b).sort((p, q) => p - q).map((gx) => startAt(gx + 5))].filter(
        (c) => c.from >= left && c.to <= right,
      );
      const crossed = (c: { from: number; to: number }) => lines.some((gx) => gx >= c.from - 3 && gx <= c.to + 3);
      const side = sides.find((c) => !crossed(c)) ?? sides[0] ?? leftOfSpan;
      guides.push({
        kind: 'rise',
        value: input.maxRiseTime,
        d,
        label: side.label,
      });
    }
  }

  const xt = axisTicks(0, tMax, Math.max(2, Math.round(frame.width / 70)));
  const yt = axisTicks(yMin, yMax, Math.max(2, Math.round(frame.height / 40)));
  const xAxis: Axis = {
    step: xt.step,
    ticks: xt.values.map((v) => ({ value: v, position: Math.round(X(v) * 100) / 100, label: formatTick(v, xt.decimals) })),
    title: { x: frame.x + frame.width / 2, y: height - 4, text: 'Time (s)', anchor: 'middle', baseline: 'bottom' },
  };
  const yAxis: Axis = {
    step: yt.step,
    ticks: yt.values.map((v) => ({ value: v, position: Math.round(Y(v) * 100) / 100, label: formatTick(v, yt.decimals) })),
    title: { x: 10, y: frame.y + frame.height / 2, text: 'Output y(t)', anchor: 'middle', baseline: 'top', rotate: -90 },
  };
  const gridPath = [
    ...xAxis.ticks.map((t) => `M${f(t.position)},${f(frame.y)}L${f(t.position)},${f(frame.y + frame.height)}`),
    ...yAxis.ticks.map((t) => `M${f(left)},${f(t.position)}L${f(right)},${f(t.position)}`),
  ].join('');

  return {
    width,
    height,
    frame,
    framePath: rectPath(frame.x, frame.y, frame.width, frame.height),
    xDomain: [0, tMax],
    yDomain: [yMin, yMax],
    responsePath,
    finalValuePath,
    bandPath,
    bandEdgesPath,
    bandLabel,
    guides,
    gridPath,
    xAxis,
    yAxis,
  };
}
