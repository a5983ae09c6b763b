import { type Complex, splanePlot } from '@polecourt/plots';
import { useMemo } from 'react';

import { SvgLabel } from '@/components/plots/step-plot';
import { formatComplex } from '@/lib/format';

/** A small pole-zero map (x poles, o zeros) of a model, without any requirement region. */
export function PoleZeroPreview({
  poles,
  zeros,
  width = 320,
  height = 220,
  title = 'Pole-zero map',
}: {
  poles: readonly Complex[];
  zeros: readonly Complex[];
  width?: number;
  height?: number;
  title?: string;
}) {
  const plot = useMemo(() => splanePlot({ width, height, poles, zeros, markSize: 5, margin: { left: 46, bottom: 36, top: 8, right: 10 } }), [width, height, poles, zeros]);
  const description = `${poles.length} poles: ${poles.map((p) => formatComplex(p)).join(', ') || 'none'}. ${zeros.length} zeros: ${zeros.map((z) => formatComplex(z)).join(', ') || 'none'}.`;
  const { frame } = plot;
  return (
    <svg width={width} height={height} viewBox={`0 0 ${width} ${height}`} role="img" aria-label={`${title}. ${description}`} className="block max-w-full" data-plot="pole-zero-preview">
      <rect x={frame.x} y={frame.y} width={frame.width} height={frame.height} className="fill-paper-raised" />
      <path d={plot.gridPath} className="fill-none stroke-rule" />
      {plot.realAxisPath && <path d={plot.realAxisPath} className="fill-none stroke-ink-faint" />}
      {plot.imaginaryAxisPath && <path d={plot.imaginaryAxisPath} className="fill-none stroke-ink-faint" />}
      {plot.zeroMarks.map((m, i) => (
        <path key={`z${i}`} d={m.d} className="fill-none stroke-ink" strokeWidth={1.75} />
      ))}
      {plot.poleMarks.map((m, i) => (
        <path key={`p${i}`} d={m.d} className="fill-none stroke-accent-strong" strokeWidth={2} />
      ))}
      {plot.offPlot.map((m, i) => (
        <path key={`o${i}`} d={m.d} className="fill-ink-muted" />
      ))}
      <path d={plot.framePath} className="fill-none stroke-rule-strong" />
      {plot.xAxis.ticks.map((t) => (
        <text key={`x${t.value}`} x={t.position} y={frame.y + frame.height + 5} textAnchor="middle" dominantBaseline="hanging" fontSize={10} className="fill-ink-muted">
          {t.label}
        </text>
      ))}
      {plot.yAxis.ticks.map((t) => (
        <text key={`y${t.value}`} x={frame.x - 5} y={t.position} textAnchor="end" dominantBaseline="central" fontSize={10} className="fill-ink-muted">
          {t.label}
        </text>
      ))}
      <SvgLabel label={plot.xAxis.title} className="fill-ink" />
      <SvgLabel label={plot.yAxis.title} className="fill-ink" />
    </svg>
  );
}
