import { type Label, type SampledPoint, stepPlot } from '@polecourt/plots';
import { type KeyboardEvent, type PointerEvent, useEffect, useId, useMemo, useRef, useState } from 'react';

import { formatNumber } from '@/lib/format';

export interface StepPlotProps {
  /** The exact step response, sampled (t ascending, seconds). */
  samples: readonly SampledPoint[];
  /** y_f = G(0); null when there is none to draw guides around. */
  finalValue: number | null;
  settlingBandPct?: number | null;
  maxOvershootPct?: number | null;
  maxPeakTime?: number | null;
  maxSettlingTime?: number | null;
  maxRiseTime?: number | null;
  /** What the plot shows, read out by screen readers. */
  label: string;
  height?: number;
}

const FONT_SIZE = 11;

// The box's own width, so the geometry is drawn at real pixel size and text keeps its size.
function useWidth<T extends HTMLElement>(fallback: number) {
  const ref = useRef<T>(null);
  const [width, setWidth] = useState(fallback);
  useEffect(() => {
    const el = ref.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(([entry]) => {
      const next = Math.floor(entry?.contentRect.width ?? 0);
      if (next > 0) setWidth(next);
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  return [ref, width] as const;
}

export function SvgLabel({ label, className }: { label: Label; className?: string }) {
  const baseline = label.baseline === 'top' ? 'hanging' : label.baseline === 'middle' ? 'central' : 'auto';
  return (
    <text
      x={label.x}
      y={label.y}
      textAnchor={label.anchor}
      dominantBaseline={baseline}
      transform={label.rotate ? `rotate(${label.rotate} ${label.x} ${label.y})` : undefined}
      className={className}
      fontSize={FONT_SIZE}
    >
      {label.text}
    </text>
  );
}

// Index of the sample nearest to time t (samples ascending in t).
function nearestIndex(samples: readonly SampledPoint[], t: number): number {
  let lo = 0;
  let hi = samples.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (samples[mid]!.t < t) lo = mid;
    else hi = mid;
  }
  const a = samples[lo];
  const b = samples[hi];
  if (!a || !b) return lo;
  return Math.abs(a.t - t) <= Math.abs(b.t - t) ? lo : hi;
}

/**
 * The exact step response with the settling band, the overshoot ceiling and the time limits as
 * labelled guides. Pointer hover (or the arrow keys once focused) reads out t and y.
 */
export function StepPlot({ samples, finalValue, settlingBandPct, maxOvershootPct, maxPeakTime, maxSettlingTime, maxRiseTime, label, height = 340 }: StepPlotProps) {
  const [boxRef, width] = useWidth<HTMLDivElement>(640);
  const readoutId = useId();
  const [cursor, setCursor] = useState<number | null>(null);

  const plot = useMemo(
    () =>
      stepPlot({
        width,
        height,
        samples,
        finalValue,
        settlingBandPct: settlingBandPct ?? null,
        maxOvershootPct: maxOvershootPct ?? null,
        maxPeakTime: maxPeakTime ?? null,
        maxSettlingTime: maxSettlingTime ?? null,
        maxRiseTime: maxRiseTime ?? null,
        fontSize: FONT_SIZE,
        margin: { left: 56, bottom: 42, top: 14, right: 16 },
      }),
    [width, height, samples, finalValue, settlingBandPct, maxOvershootPct, maxPeakTime, maxSettlingTime, maxRiseTime],
  );

  const { frame, xDomain, yDomain } = plot;
  const toX = (t: number) => frame.x + ((t - xDomain[0]) / (xDomain[1] - xDomain[0])) * frame.width;
  const toY = (v: number) => frame.y + frame.height - ((v - yDomain[0]) / (yDomain[1] - yDomain[0])) * frame.height;
  const point = cursor === null ? null : (samples[cursor] ?? null);

  const onPointerMove = (event: PointerEvent<SVGSVGElement>) => {
    if (samples.length === 0) return;
    const rect = event.currentTarget.getBoundingClientRect();
    const px = ((event.clientX - rect.left) / rect.width) * width;
    if (px < frame.x || px > frame.x + frame.width) {
      setCursor(null);
      return;
    }
    const t = xDomain[0] + ((px - frame.x) / frame.width) * (xDomain[1] - xDomain[0]);
    setCursor(nearestIndex(samples, t));
  };

  const onKeyDown = (event: KeyboardEvent<SVGSVGElement>) => {
    if (samples.length === 0) return;
    const last = samples.length - 1;
    // Steps of about one hundredth of the window, whatever the sample spacing.
    const stepT = (xDomain[1] - xDomain[0]) / 100;
    const current = point ?? samples[0]!;
    let next: number | null = null;
    if (event.key === 'ArrowRight') next = nearestIndex(samples, current.t + stepT);
    else if (event.key === 'ArrowLeft') next = nearestIndex(samples, current.t - stepT);
    else if (event.key === 'Home') next = 0;
    else if (event.key === 'End') next = last;
    else if (event.key === 'Escape') {
      setCursor(null);
      return;
    }
    if (next === null) return;
    event.preventDefault();
    // A key press from no cursor starts at the first sample rather than skipping ahead.
    setCursor(point === null && (event.key === 'ArrowRight' || event.key === 'ArrowLeft') ? 0 : next);
  };

  const readout = point ? `t = ${formatNumber(point.t)} s, y = ${formatNumber(point.y)}` : null;

  return (
    <div ref={boxRef} className="w-full">
      <svg
        width={width}
        height={height}
        viewBox={`0 0 ${width} ${height}`}
        role="img"
        aria-label={label}
        aria-describedby={readoutId}
        tabIndex={0}
        onPointerMove={onPointerMove}
        onPointerLeave={() => setCursor(null)}
        onKeyDown={onKeyDown}
        onBlur={() => setCursor(null)}
        className="block max-w-full touch-none select-none"
        data-plot="step-response"
      >
        <rect x={frame.x} y={frame.y} width={frame.width} height={frame.height} className="fill-paper-raised" />
        <path d={plot.gridPath} className="fill-none stroke-rule" strokeWidth={1} />
        {plot.bandPath && <path d={plot.bandPath} className="fill-accent/10" data-guide="settling-band" />}
        {plot.bandEdgesPath && <path d={plot.bandEdgesPath} className="fill-none stroke-accent/60" strokeDasharray="4 3" strokeWidth={1} />}
        {plot.finalValuePath && <path d={plot.finalValuePath} className="fill-none stroke-ink-faint" strokeDasharray="2 3" strokeWidth={1} />}
        {plot.guides.map((g) => (
          <path
            key={`${g.kind}-${g.value}`}
            d={g.d}
            className={g.kind === 'ceiling' ? 'fill-none stroke-fail' : 'fill-none stroke-caution'}
            strokeDasharray={g.kind === 'rise' ? undefined : '6 4'}
            strokeWidth={1.25}
            data-guide={g.kind}
          />
        ))}
        <path d={plot.responsePath} className="fill-none stroke-accent" strokeWidth={2} strokeLinejoin="round" data-series="response" />
        <path d={plot.framePath} className="fill-none stroke-rule-strong" strokeWidth={1} />

        {plot.bandLabel && <SvgLabel label={plot.bandLabel} className="fill-accent" />}
        {plot.guides.map((g) => (
          <SvgLabel key={`label-${g.kind}-${g.value}`} label={g.label} className={g.kind === 'ceiling' ? 'fill-fail' : 'fill-caution'} />
        ))}

        {plot.xAxis.ticks.map((tick) => (
          <g key={`x-${tick.value}`}>
            <path d={`M${tick.position},${frame.y + frame.height}v4`} className="stroke-ink-muted" />
            <text x={tick.position} y={frame.y + frame.height + 7} textAnchor="middle" dominantBaseline="hanging" fontSize={FONT_SIZE} className="fill-ink-muted">
              {tick.label}
            </text>
          </g>
        ))}
        {plot.yAxis.ticks.map((tick) => (
          <g key={`y-${tick.value}`}>
            <path d={`M${frame.x - 4},${tick.position}h4`} className="stroke-ink-muted" />
            <text x={frame.x - 7} y={tick.position} textAnchor="end" dominantBaseline="central" fontSize={FONT_SIZE} className="fill-ink-muted">
              {tick.label}
            </text>
          </g>
        ))}
        <SvgLabel label={plot.xAxis.title} className="fill-ink" />
        <SvgLabel label={plot.yAxis.title} className="fill-ink" />

        {point && (
          <g pointerEvents="none" data-readout="">
            <path d={`M${toX(point.t)},${frame.y}V${frame.y + frame.height}`} className="stroke-ink-muted" strokeWidth={1} />
            <circle cx={toX(point.t)} cy={toY(point.y)} r={4} className="fill-paper-raised stroke-accent-strong" strokeWidth={2} />
            <ReadoutBox x={toX(point.t)} y={frame.y + 6} frameRight={frame.x + frame.width} text={readout ?? ''} />
          </g>
        )}
      </svg>
      <p id={readoutId} aria-live="polite" className="mt-1 min-h-5 text-xs text-ink-muted tabular-nums">
        {readout ?? 'Hover over the plot, or focus it and use the arrow keys, to read t and y.'}
      </p>
    </div>
  );
}

function ReadoutBox({ x, y, frameRight, text }: { x: number; y: number; frameRight: number; text: string }) {
  const w = text.length * FONT_SIZE * 0.58 + 12;
  const left = x + 8 + w > frameRight ? x - 8 - w : x + 8;
  return (
    <g>
      <rect x={left} y={y} width={w} height={FONT_SIZE + 10} rx={3} className="fill-ink/85" />
      <text x={left + 6} y={y + 5} dominantBaseline="hanging" fontSize={FONT_SIZE} className="fill-paper-raised tabular-nums">
        {text}
      </text>
    </g>
  );
}
