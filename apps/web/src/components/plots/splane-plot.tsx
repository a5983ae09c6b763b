// The s-plane plot: the admissible region shaded translucent teal with a solid edge, each
// limit's boundary keyed to its label, poles as x, zeros as o, the dominant pole or pair
// ringed, the dominance threshold as a dashed vertical line; zoom (wheel, + and - buttons
// or keys), pan (drag, arrow keys), reset; a read-out for the pole under the pointer or
// picked with the keyboard (zeta, omega_n and the slack to every limit).
import type { Complex, RegionInput, Viewport } from '@polecourt/plots';
import { type RegionBounds, type Requirements, regionBounds, regionPolygons, regionSlack } from '@polecourt/spec';
import { type KeyboardEvent, type PointerEvent, type ReactNode, type RefObject, memo, useCallback, useEffect, useId, useLayoutEffect, useMemo, useRef, useState } from 'react';

import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { Button } from '@/components/ui/button';
import { formatComplex, formatNumber, formatQuantity } from '@/lib/format';
import { REQUIREMENT_FIELD_INFO } from '@/lib/requirement-fields';

import { drawCrosses, drawRings } from './draw-marks';
import { type SplaneGeometry, defaultView, nearestRoot, panView, splaneGeometry, viewCentre, zoomView } from './splane-geometry';

export interface SplanePlotProps {
  /** Accessible name of the plot, e.g. "Admissible region of revision 3". */
  title: string;
  /**
   * Limits to draw the admissible region for (checked values, e.g. parsed by the engine's
   * requirementsSchema). The region is recomputed in the browser for every view, so it stays
   * whole while zooming and panning; the read-out gives each pole's slack to these limits.
   */
  requirements?: Requirements | null;
  /** Or a region already computed (e.g. GET /api/revisions/:id/region's `polygons`); drawn as is. */
  region?: RegionInput | null;
  poles?: readonly Complex[];
  zeros?: readonly Complex[];
  /** The dominant pole or conjugate pair: ringed, and the base of the dominance threshold. */
  dominantPoles?: readonly Complex[];
  /** Draws the dominance threshold at ratio x the dominant real part; defaults to the requirements' ratio (or 5). */
  dominanceRatio?: number | null;
  /** The first view (and the one "Reset view" returns to); fitted to the region and poles when left out. */
  viewport?: Viewport;
  /** Height of the plot in pixels; the width follows the container. Default: 0.7 x the width, 280 to 520. */
  height?: number;
  /** Text under the plot (e.g. what the preview shows). */
  caption?: ReactNode;
  /** Called after each redraw is committed, with the time from render start in milliseconds. */
  onRedraw?: (ms: number) => void;
  className?: string;
}

const ZOOM_STEP = 1.25;
const HEAVY_MARKS = 2000;
const PAN_STEP = 0.1;
const SLACK_UNIT: Record<string, string> = { maxOvershootPct: '%', maxSettlingTime: 's', maxPeakTime: 's', maxRiseTime: 's', minDampingRatio: '', maxNaturalFrequency: 'rad/s' };

/** The plot inside its own error boundary: a failure in the geometry never takes the page down. */
export function SplanePlot(props: SplanePlotProps) {
  return (
    <ErrorBoundary fallback={({ error, reset }) => <ErrorPanel error={error} title="The s-plane plot could not be drawn" onRetry={reset} />}>
      <SplanePlotInner {...props} />
    </ErrorBoundary>
  );
}

function useWidth(ref: RefObject<HTMLElement | null>, initial: number): number {
  const [width, setWidth] = useState(initial);
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el) return;
    const measure = () => setWidth(Math.max(240, Math.floor(el.getBoundingClientRect().width)));
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(el);
    return () => observer.disconnect();
  }, [ref]);
  return width;
}

function sameView(a: Viewport, b: Viewport): boolean {
  return a.reMin === b.reMin && a.reMax === b.reMax && a.imMin === b.imMin && a.imMax === b.imMax;
}

function SplanePlotInner({
  title,
  requirements = null,
  region: givenRegion = null,
  poles = EMPTY,
  zeros = EMPTY,
  dominantPoles = EMPTY,
  dominanceRatio,
  viewport,
  height: givenHeight,
  caption,
  onRedraw,
  className,
}: SplanePlotProps) {
  const renderStart = performance.now();
  const containerRef = useRef<HTMLDivElement>(null);
  const plotRef = useRef<HTMLDivElement>(null);
  const width = useWidth(containerRef, 640);
  const height = givenHeight ?? Math.round(Math.min(520, Math.max(280, width * 0.7)));
  const ids = useId();
  const helpId = `${ids}-help`;
  const legendId = `${ids}-legend`;

  const bounds: RegionBounds | null = useMemo(() => (requirements ? regionBounds(requirements) : null), [requirements]);
  const ratio = dominanceRatio !== undefined ? dominanceRatio : (bounds?.dominanceRatio ?? 5);

  const fitted = useMemo(() => {
    if (viewport) return viewport;
    const riseOmega = bounds?.riseTimeCurve[0]?.minNaturalFrequency ?? null;
    // Where the damping rays meet the decay-rate line: the region's corner, worth keeping in view.
    const zeta = bounds?.minDampingRatio ?? null;
    const corner = bounds?.minDecayRate && zeta !== null && zeta > 0 && zeta < 1 ? bounds.minDecayRate * Math.tan(Math.acos(zeta)) : 0;
    const focus = bounds
      ? {
          minDecayRate: bounds.minDecayRate,
          // The rise-time curve lies about f(zeta_min) / Tr from the origin: keep that much in view too.
          minDampedFrequency: Math.max(bounds.minDampedFrequency ?? 0, riseOmega ?? 0, corner) || null,
          maxNaturalFrequency: bounds.maxNaturalFrequency,
        }
      : null;
    return defaultView({ width, height, poles, zeros, dominantPoles, dominanceRatio: ratio, region: focus });
  }, [viewport, bounds, width, height, poles, zeros, dominantPoles, ratio]);

  // The reader's own view once they zoom or pan; until then the plot follows the fitted one.
  const [userView, setUserView] = useState<Viewport | null>(null);
  const view = userView ?? fitted;

  const region: RegionInput | null = useMemo(() => {
    if (bounds) return regionPolygons(bounds, view);
    return givenRegion;
  }, [bounds, givenRegion, view]);

  const markSize = poles.length > 2000 ? 3 : 5;
  // With thousands of marks the pole and zero marks go on a canvas between two SVG layers (the
  // browser's path rasteriser was most of a redraw), and a redraw costs a few hundred milliseconds in a software-rendered
  // browser, so a drag or a wheel gesture moves the drawn picture (a compositor transform) and
  // the plot is redrawn once, when the gesture ends.
  const heavy = poles.length + zeros.length > HEAVY_MARKS;
  const pictureRef = useRef<HTMLDivElement>(null);
  const geometry = useMemo(
    () => splaneGeometry({ width, height, view, region, poles, zeros, dominantPoles, dominanceRatio: ratio, markSize, asPoints: heavy }),
    [width, height, view, region, poles, zeros, dominantPoles, ratio, markSize, heavy],
  );

  useLayoutEffect(() => {
    // The new picture replaces the moved one in the same frame.
    if (pictureRef.current) pictureRef.current.style.transform = '';
  }, [geometry]);

  useLayoutEffect(() => {
    onRedraw?.(performance.now() - renderStart);
  });

  // ---- view changes -----------------------------------------------------------------------
  const zoomBy = useCallback(
    (factor: number, at?: Complex) => setUserView((v) => zoomView(v ?? fitted, factor, at ?? viewCentre(v ?? fitted))),
    [fitted],
  );
  const panBy = useCallback(
    (fx: number, fy: number) =>
      setUserView((v) => {
        const base = v ?? fitted;
        return panView(base, (base.reMax - base.reMin) * fx, (base.imMax - base.imMin) * fy);
      }),
    [fitted],
  );
  const reset = useCallback(() => setUserView(null), []);

  // Wheel zoom needs a non-passive listener to keep the page from scrolling.
  const geometryRef = useRef<SplaneGeometry>(geometry);
  geometryRef.current = geometry;
  useEffect(() => {
    const el = plotRef.current;
    if (!el) return;
    let gesture: { factor: number; x: number; y: number; timer: ReturnType<typeof setTimeout> | null } | null = null;
    const onWheel = (event: WheelEvent) => {
      event.preventDefault();
      const box = el.getBoundingClientRect();
      const x = event.clientX - box.left;
      const y = event.clientY - box.top;
      const step = event.deltaY < 0 ? 1 / ZOOM_STEP : ZOOM_STEP;
      const picture = pictureRef.current;
      if (!heavy || !picture) {
        zoomBy(step, geometryRef.current.toPlane(x, y));
        return;
      }
      gesture ??= { factor: 1, x, y, timer: null };
      gesture.factor *= step;
      picture.style.transformOrigin = `${gesture.x}px ${gesture.y}px`;
      picture.style.transform = `scale(${1 / gesture.factor})`;
      if (gesture.timer) clearTimeout(gesture.timer);
      gesture.timer = setTimeout(() => {
        const g = gesture!;
        gesture = null;
        zoomBy(g.factor, geometryRef.current.toPlane(g.x, g.y));
      }, 150);
    };
    el.addEventListener('wheel', onWheel, { passive: false });
    return () => {
      el.removeEventListener('wheel', onWheel);
      if (gesture?.timer) clearTimeout(gesture.timer);
    };
  }, [zoomBy, heavy]);

  // ---- pole read-out ----------------------------------------------------------------------
  const [hovered, setHovered] = useState<number | null>(null);
  const [picked, setPicked] = useState<number | null>(null);
  const shown = hovered ?? picked;
  const shownPole = shown !== null ? poles[shown] : undefined;
  useEffect(() => {
    // A new set of poles: forget indices that pointed into the old one.
    setHovered(null);
    setPicked(null);
  }, [poles]);
  const pick = (step: number) => {
    if (poles.length === 0) return;
    setPicked((p) => (p === null ? (step > 0 ? 0 : poles.length - 1) : (p + step + poles.length) % poles.length));
  };

  // ---- dragging ---------------------------------------------------------------------------
  const drag = useRef<{ x: number; y: number; view: Viewport; moved: boolean; next: Viewport | null } | null>(null);
  const frame = useRef<number | null>(null);
  const onPointerDown = (event: PointerEvent<HTMLDivElement>) => {
    if (event.button !== 0) return;
    event.currentTarget.setPointerCapture(event.pointerId);
    drag.current = { x: event.clientX, y: event.clientY, view, moved: false, next: null };
  };
  const onPointerMove = (event: PointerEvent<HTMLDivElement>) => {
    const d = drag.current;
    const box = event.currentTarget.getBoundingClientRect();
    if (d) {
      const dx = event.clientX - d.x;
      const dy = event.clientY - d.y;
      if (!d.moved && Math.hypot(dx, dy) < 3) return;
      d.moved = true;
      const f = geometry.plot.frame;
      const next = panView(d.view, (-dx * (d.view.reMax - d.view.reMin)) / f.width, (dy * (d.view.imMax - d.view.imMin)) / f.height);
      if (heavy && pictureRef.current) {
        d.next = next;
        pictureRef.current.style.transform = `translate(${dx}px, ${dy}px)`;
        return;
      }
      // One redraw per animation frame, however fast the pointer moves.
      if (frame.current !== null) cancelAnimationFrame(frame.current);
      frame.current = requestAnimationFrame(() => {
        frame.current = null;
        setUserView(next);
      });
      return;
    }
    if (poles.length === 0) return;
    setHovered(nearestRoot(poles, geometry.toPixel, event.clientX - box.left, event.clientY - box.top, 10));
  };
  const endDrag = () => {
    const next = drag.current?.next;
    drag.current = null;
    if (next) setUserView(next);
  };

  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    const keys: Record<string, () => void> = {
      ArrowLeft: () => panBy(-PAN_STEP, 0),
      ArrowRight: () => panBy(PAN_STEP, 0),
      ArrowUp: () => panBy(0, PAN_STEP),
      ArrowDown: () => panBy(0, -PAN_STEP),
      '+': () => zoomBy(1 / ZOOM_STEP),
      '=': () => zoomBy(1 / ZOOM_STEP),
      '-': () => zoomBy(ZOOM_STEP),
      _: () => zoomBy(ZOOM_STEP),
      '0': reset,
      ']': () => pick(1),
      '[': () => pick(-1),
    };
    const action = keys[event.key];
    if (action) {
      event.preventDefault();
      action();
    }
  };

  const { plot } = geometry;
  const clipId = `${ids}-clip`.replace(/:/g, '');
  const shownPixel = shownPole ? geometry.toPixel(shownPole) : null;
  const feasible = bounds ? bounds.feasible : true;
  const offPlotCount = plot.offPlot.length + geometry.hiddenPoles + geometry.hiddenZeros;

  return (
    <figure ref={containerRef} className={className ?? 'flex min-w-0 flex-col gap-2'}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <figcaption className="text-sm font-semibold">{title}</figcaption>
        <div className="flex gap-1" role="group" aria-label="View of the s-plane">
          <Button size="sm" aria-label="Zoom in" onClick={() => zoomBy(1 / ZOOM_STEP)}>
            +
          </Button>
          <Button size="sm" aria-label="Zoom out" onClick={() => zoomBy(ZOOM_STEP)}>
            −
          </Button>
          <Button size="sm" onClick={reset} disabled={userView === null || sameView(userView, fitted)}>
            Reset view
          </Button>
        </div>
      </div>
      <div
        ref={plotRef}
        role="group"
        tabIndex={0}
        aria-label={`${title}: s-plane plot`}
        aria-describedby={`${helpId} ${legendId}`}
        className="relative cursor-grab touch-none overflow-hidden select-none rounded border border-rule bg-paper-raised active:cursor-grabbing"
        onPointerDown={onPointerDown}
        onPointerMove={onPointerMove}
        onPointerUp={endDrag}
        onPointerCancel={endDrag}
        onPointerLeave={() => setHovered(null)}
        onKeyDown={onKeyDown}
      >
        <div ref={pictureRef} className="relative will-change-transform">
          <svg width={plot.width} height={plot.height} viewBox={`0 0 ${plot.width} ${plot.height}`} aria-hidden="true" className="block max-w-full">
            <defs>
              <clipPath id={clipId}>
                <path d={plot.framePath} />
              </clipPath>
            </defs>
            <PlotBackdrop geometry={geometry} />
            <g clipPath={`url(#${clipId})`}>
              {plot.regionPaths.map((d, i) => (
                <path key={i} data-testid="splane-region" d={d} fill="var(--color-accent)" fillOpacity={0.16} stroke="var(--color-accent)" strokeWidth={1.75} strokeLinejoin="round" />
              ))}
              {plot.boundaryPaths.map((b) => (
                <path
                  key={b.key}
                  d={b.d}
                  fill="none"
                  stroke={b.binding ? 'var(--color-accent-strong)' : 'var(--color-ink-faint)'}
                  strokeWidth={1}
                  strokeDasharray={b.binding ? undefined : '2 3'}
                  opacity={0.8}
                />
              ))}
              {plot.dominanceLine && (
                <path d={plot.dominanceLine.d} fill="none" stroke="var(--color-ink-muted)" strokeWidth={1.25} strokeDasharray="6 4" />
              )}
              {shownPixel && <circle cx={shownPixel.x} cy={shownPixel.y} r={markSize * 2.6} fill="none" stroke="var(--color-caution)" strokeWidth={2} />}
            </g>
            {/* Outside the clip group: clipping thousands of strokes costs more than drawing them; every mark drawn is inside the view already. */}
            {!heavy && <Marks geometry={geometry} />}
            {!heavy && <UpperLayer geometry={geometry} />}
          </svg>
          {heavy && (
            <>
              <MarkCanvas geometry={geometry} markSize={markSize} />
              {/* What lies over the marks (rings, edge marks, labels) stays vector, in a second SVG on top. */}
              <svg width={plot.width} height={plot.height} viewBox={`0 0 ${plot.width} ${plot.height}`} aria-hidden="true" className="pointer-events-none absolute top-0 left-0 block max-w-full">
                <UpperLayer geometry={geometry} />
              </svg>
            </>
          )}
        </div>
        {shownPole && shownPixel && hovered !== null && <Tooltip pole={shownPole} x={shownPixel.x} y={shownPixel.y} width={plot.width} />}
      </div>

      <p id={helpId} className="text-xs text-ink-muted">
        Drag or use the arrow keys to pan, the wheel or + and − to zoom, 0 to reset.
        {poles.length > 0 && ' Point at a pole, or press [ and ] with the plot focused, to read it out.'}
      </p>

      {!feasible && (
        <p role="status" className="rounded border border-fail/50 bg-fail-soft px-3 py-2 text-sm">
          <span className="font-semibold">No admissible region.</span> No pole position meets every limit at once; loosen a limit.
        </p>
      )}

      <div id={legendId}>
        <BoundaryLegend boundaries={plot.boundaryPaths} dominance={plot.dominanceLine?.label.text ?? null} marginApplied={bounds?.marginApplied ?? false} />
      </div>
      {offPlotCount > 0 && (
        <p className="text-xs text-ink-muted">
          {offPlotCount === 1 ? 'One root lies' : `${offPlotCount} roots lie`} outside this view
          {plot.offPlot.length > 0 ? ' (triangles on the edge point their way)' : ''}. Zoom out to see {offPlotCount === 1 ? 'it' : 'them'}.
        </p>
      )}

      {poles.length > 0 && (
        <PoleReadout
          poles={poles}
          index={shown}
          requirements={requirements}
          onPrevious={() => pick(-1)}
          onNext={() => pick(1)}
        />
      )}
      {caption && <div className="text-xs text-ink-muted">{caption}</div>}
    </figure>
  );
}

const EMPTY: readonly Complex[] = [];

// Grid, axes, ticks and titles; separate so a hover re-render does not rebuild them.
const PlotBackdrop = memo(function PlotBackdrop({ geometry }: { geometry: SplaneGeometry }) {
  const { plot } = geometry;
  const f = plot.frame;
  return (
    <g>
      <path d={plot.framePath} fill="var(--color-paper-raised)" stroke="var(--color-rule-strong)" />
      <path d={plot.gridPath} fill="none" stroke="var(--color-rule)" strokeWidth={0.75} />
      {plot.realAxisPath && <path d={plot.realAxisPath} stroke="var(--color-ink-faint)" strokeWidth={1} />}
      {plot.imaginaryAxisPath && <path d={plot.imaginaryAxisPath} stroke="var(--color-ink-faint)" strokeWidth={1} />}
      {plot.xAxis.ticks.map((t) => (
        <text key={`x${t.value}`} x={t.position} y={f.y + f.height + 14} textAnchor="middle" fontSize={11} fill="var(--color-ink-muted)">
          {t.label}
        </text>
      ))}
      {plot.yAxis.ticks.map((t) => (
        <text key={`y${t.value}`} x={f.x - 6} y={t.position} textAnchor="end" dominantBaseline="central" fontSize={11} fill="var(--color-ink-muted)">
          {t.label}
        </text>
      ))}
      <text x={f.x + f.width / 2} y={plot.height - 6} textAnchor="middle" fontSize={12} fill="var(--color-ink)">
        Re s (1/s)
      </text>
      <text transform={`translate(14,${f.y + f.height / 2}) rotate(-90)`} textAnchor="middle" fontSize={12} fill="var(--color-ink)">
        Im s (rad/s)
      </text>
    </g>
  );
});

// All poles in one path, all zeros in another: 10,000 marks cost one element each.
const Marks = memo(function Marks({ geometry }: { geometry: SplaneGeometry }) {
  return (
    <g>
      {geometry.zeroPath && <path data-testid="splane-zeros" d={geometry.zeroPath} fill="none" stroke="var(--color-ink)" strokeWidth={1.5} />}
      {geometry.polePath && <path data-testid="splane-poles" d={geometry.polePath} fill="none" stroke="var(--color-ink)" strokeWidth={1.5} />}
    </g>
  );
});

// Drawn over the marks: the dominant rings, the edge marks for roots outside the view and the labels.
const UpperLayer = memo(function UpperLayer({ geometry }: { geometry: SplaneGeometry }) {
  const { plot } = geometry;
  return (
    <>
      {geometry.ringPath && <path data-testid="splane-dominant" d={geometry.ringPath} fill="none" stroke="var(--color-accent-strong)" strokeWidth={1.5} />}
      {plot.offPlot.map((m, i) => (
        <g key={i}>
          <path d={m.d} fill="var(--color-ink-muted)" />
        </g>
      ))}
      {plot.dominanceLine && (
        <text x={plot.dominanceLine.label.x} y={plot.dominanceLine.label.y} textAnchor={plot.dominanceLine.label.anchor} dominantBaseline="hanging" fontSize={11} fill="var(--color-ink-muted)" paintOrder="stroke" stroke="var(--color-paper-raised)" strokeWidth={3}>
          {plot.dominanceLine.label.text}
        </text>
      )}
      {plot.boundaryPaths.map((b) => (
        <g key={b.key} transform={`translate(${b.anchor.x},${b.anchor.y})`}>
          <circle r={8} fill="var(--color-paper-raised)" stroke="var(--color-accent-strong)" strokeWidth={1} />
          <text textAnchor="middle" dominantBaseline="central" fontSize={10} fontWeight={600} fill="var(--color-accent-strong)">
            {b.key}
          </text>
        </g>
      ))}
    </>
  );
});

// The ink colour as RGBA bytes: letting a 1x1 canvas parse the computed colour accepts any CSS colour syntax.
function inkRgba(el: HTMLElement): [number, number, number, number] {
  const probe = document.createElement('canvas').getContext('2d', { willReadFrequently: true });
  if (!probe) return [0, 0, 0, 255];
  probe.fillStyle = getComputedStyle(el).color;
  probe.fillRect(0, 0, 1, 1);
  const [r = 0, g = 0, b = 0, a = 255] = probe.getImageData(0, 0, 1, 1).data;
  return [r, g, b, a];
}

// The pole and zero marks of a large set, on a canvas in the same box as the SVG, at the
// screen's device pixel ratio, written pixel by pixel (see draw-marks.ts). The box can be a
// little narrower than the plot (max-width), where the SVG scales its viewBox to fit: the
// backing store follows the box as laid out and the marks take the same scale and offset, so
// they stay crisp and land where the SVG would put them.
const MarkCanvas = memo(function MarkCanvas({ geometry, markSize }: { geometry: SplaneGeometry; markSize: number }) {
  const ref = useRef<HTMLCanvasElement>(null);
  const { width, height } = geometry.plot;
  useLayoutEffect(() => {
    const canvas = ref.current;
    const ctx = canvas?.getContext('2d');
    if (!canvas || !ctx) return;
    const dpr = window.devicePixelRatio || 1;
    const box = canvas.getBoundingClientRect();
    const deviceWidth = Math.max(1, Math.round(box.width * dpr));
    const deviceHeight = Math.max(1, Math.round(box.height * dpr));
    if (canvas.width !== deviceWidth) canvas.width = deviceWidth;
    if (canvas.height !== deviceHeight) canvas.height = deviceHeight;
    // The viewBox's default fit (xMidYMid meet): one scale, the content centred.
    const fit = Math.min(box.width / width, box.height / height);
    const scale = fit * dpr;
    const dx = ((box.width - width * fit) / 2) * dpr;
    const dy = ((box.height - height * fit) / 2) * dpr;
    const toDevice = (points: Float64Array) => points.map((v, i) => v * scale + (i % 2 === 0 ? dx : dy));
    const image = ctx.createImageData(deviceWidth, deviceHeight);
    const buf = { data: image.data, width: deviceWidth, height: deviceHeight };
    const style = { radius: markSize * scale, thickness: Math.max(1, Math.round(1.5 * dpr)), rgba: inkRgba(canvas) };
    drawCrosses(buf, toDevice(geometry.polePoints), style);
    drawRings(buf, toDevice(geometry.zeroPoints), style);
    ctx.putImageData(image, 0, 0);
  }, [geometry, markSize, width, height]);
  return (
    <canvas
      ref={ref}
      data-testid="splane-poles"
      data-marks={geometry.markCount}
      aria-hidden="true"
      className="pointer-events-none absolute top-0 left-0 block max-w-full text-ink"
      style={{ width, height }}
    />
  );
});

function BoundaryLegend({ boundaries, dominance, marginApplied }: { boundaries: SplaneGeometry['plot']['boundaryPaths']; dominance: string | null; marginApplied: boolean }) {
  if (boundaries.length === 0 && !dominance) return null;
  return (
    <div className="text-xs">
      <p className="sr-only">Key to the plot:</p>
      <ul className="flex flex-col gap-1">
        <li className="flex items-center gap-2">
          <span aria-hidden="true" className="inline-block h-3 w-5 rounded-sm border-[1.5px] border-accent bg-accent/15" />
          <span>Admissible region: dominant poles here meet every limit{marginApplied ? ' with the margin applied' : ''}</span>
        </li>
        {boundaries.map((b) => (
          <li key={b.key} className="flex items-start gap-2">
            <span aria-hidden="true" className="inline-flex size-4 shrink-0 items-center justify-center rounded-full border border-accent-strong text-[10px] font-semibold text-accent-strong">
              {b.key}
            </span>
            <span>
              <span className="sr-only">Boundary {b.key}: </span>
              {b.label}
              {!b.binding && <span className="text-ink-muted"> (does not bound the region in this view)</span>}
            </span>
          </li>
        ))}
        {dominance && (
          <li className="flex items-center gap-2">
            <span aria-hidden="true" className="inline-block w-5 border-t-[1.5px] border-dashed border-ink-muted" />
            <span>{dominance}: other poles and zeros should lie left of this line</span>
          </li>
        )}
      </ul>
    </div>
  );
}

function poleStats(pole: Complex) {
  const wn = Math.hypot(pole.re, pole.im);
  return { zeta: wn > 0 ? -pole.re / wn : 0, wn };
}

function Tooltip({ pole, x, y, width }: { pole: Complex; x: number; y: number; width: number }) {
  const { zeta, wn } = poleStats(pole);
  const left = x > width - 200;
  return (
    <div
      aria-hidden="true"
      className="pointer-events-none absolute z-10 rounded border border-rule-strong bg-paper-raised px-2 py-1 text-xs shadow-sm"
      style={{ left: left ? undefined : x + 14, right: left ? width - x + 14 : undefined, top: Math.max(0, y - 40) }}
    >
      <p className="font-semibold tabular-nums">{formatComplex(pole)}</p>
      <p className="tabular-nums">
        zeta {formatNumber(zeta, 3)} · omega_n {formatQuantity(wn, 'rad/s', 3)}
      </p>
    </div>
  );
}

function PoleReadout({
  poles,
  index,
  requirements,
  onPrevious,
  onNext,
}: {
  poles: readonly Complex[];
  index: number | null;
  requirements: Requirements | null;
  onPrevious: () => void;
  onNext: () => void;
}) {
  const pole = index !== null ? poles[index] : undefined;
  const slack = pole && requirements ? regionSlack(pole, requirements) : null;
  const stats = pole ? poleStats(pole) : null;
  return (
    <section aria-label="Pole read-out" className="rounded border border-rule bg-paper px-3 py-2 text-sm">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p aria-live="polite" className="font-medium tabular-nums">
          {pole ? `Pole ${index! + 1} of ${poles.length}: ${formatComplex(pole)}` : `${poles.length} ${poles.length === 1 ? 'pole' : 'poles'}: point at one, or step through them`}
        </p>
        <div className="flex gap-1">
          <Button size="sm" onClick={onPrevious}>
            Previous pole
          </Button>
          <Button size="sm" onClick={onNext}>
            Next pole
          </Button>
        </div>
      </div>
      {pole && stats && (
        <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-0.5 tabular-nums">
          <dt className="text-ink-muted">Damping ratio zeta</dt>
          <dd>{formatNumber(stats.zeta)}</dd>
          <dt className="text-ink-muted">Natural frequency omega_n</dt>
          <dd>{formatQuantity(stats.wn, 'rad/s')}</dd>
          {slack &&
            Object.entries(slack.slack).map(([key, value]) => {
              const info = REQUIREMENT_FIELD_INFO[key as keyof typeof REQUIREMENT_FIELD_INFO];
              const unit = SLACK_UNIT[key] ?? '';
              const finite = Number.isFinite(value);
              return (
                <div key={key} className="contents">
                  <dt className="text-ink-muted">Slack to {info?.short ?? key}</dt>
                  <dd>
                    {finite ? formatQuantity(Math.abs(value), unit) : 'no finite value'}{' '}
                    <span className={value >= 0 ? 'font-medium text-pass' : 'font-medium text-fail'}>{value >= 0 ? 'inside' : 'outside'}</span>
                  </dd>
                </div>
              );
            })}
          {slack && (
            <>
              <dt className="text-ink-muted">In the admissible region</dt>
              <dd className={slack.inside ? 'font-medium text-pass' : 'font-medium text-fail'}>{slack.inside ? 'yes' : 'no'}</dd>
            </>
          )}
        </dl>
      )}
    </section>
  );
}
