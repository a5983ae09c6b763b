import type { SplanePlot, StepPlot } from '@polecourt/plots';

import { INK, type Layout } from './pdf-kit.js';

// Draws the plots package's geometry with pdfkit: the same SVG paths the web
// client puts in <path d=...>, placed with a translation to (x, y).

function axes(layout: Layout, plot: SplanePlot | StepPlot, x: number, y: number): void {
  const { doc } = layout;
  doc.save();
  doc.translate(x, y);
  doc.path(plot.gridPath).lineWidth(0.35).strokeColor(INK.rule).stroke();
  doc.path(plot.framePath).lineWidth(0.6).strokeColor(INK.ruleStrong).stroke();
  doc.restore();
  const { frame } = plot;
  for (const t of plot.xAxis.ticks) {
    layout.label({ x: t.position, y: frame.y + frame.height + 3, text: t.label, anchor: 'middle', baseline: 'top' }, x, y, { size: 7, color: INK.muted });
  }
  for (const t of plot.yAxis.ticks) {
    layout.label({ x: frame.x - 4, y: t.position, text: t.label, anchor: 'end', baseline: 'middle' }, x, y, { size: 7, color: INK.muted });
  }
  layout.label(plot.xAxis.title, x, y, { size: 7.5, color: INK.muted });
  layout.label(plot.yAxis.title, x, y, { size: 7.5, color: INK.muted });
}

export function drawSplane(layout: Layout, plot: SplanePlot, x: number, y: number): void {
  const { doc } = layout;
  axes(layout, plot, x, y);
  doc.save();
  doc.translate(x, y);
  // Everything inside the frame is clipped to it.
  doc.save();
  doc.path(plot.framePath).clip();
  for (const d of plot.regionPaths) doc.path(d).fillOpacity(0.16).fill(INK.accent);
  doc.fillOpacity(1);
  for (const b of plot.boundaryPaths) {
    doc.path(b.d).lineWidth(b.binding ? 1.1 : 0.7).strokeColor(b.binding ? INK.accent : INK.ruleStrong);
    if (!b.binding) doc.dash(2, { space: 2 });
    doc.stroke();
    doc.undash();
  }
  if (plot.realAxisPath) doc.path(plot.realAxisPath).lineWidth(0.7).strokeColor(INK.muted).stroke();
  if (plot.imaginaryAxisPath) doc.path(plot.imaginaryAxisPath).lineWidth(0.7).strokeColor(INK.muted).stroke();
  if (plot.dominanceLine) {
    doc.path(plot.dominanceLine.d).lineWidth(0.9).strokeColor(INK.caution).dash(4, { space: 3 }).stroke();
    doc.undash();
  }
  for (const r of plot.dominantRings) doc.path(r.d).lineWidth(0.9).strokeColor(INK.accentStrong).stroke();
  for (const z of plot.zeroMarks) doc.path(z.d).lineWidth(1.1).strokeColor(INK.ink).stroke();
  for (const p of plot.poleMarks) doc.path(p.d).lineWidth(1.3).strokeColor(INK.ink).stroke();
  doc.restore();
  for (const o of plot.offPlot) doc.path(o.d).fill(INK.muted);
  // Boundary keys: a small numbered disc at each anchor.
  for (const b of plot.boundaryPaths) {
    doc.circle(b.anchor.x, b.anchor.y, 5.2).fill(b.binding ? INK.accent : INK.faint);
  }
  doc.restore();
  for (const b of plot.boundaryPaths) {
    layout.label({ x: b.anchor.x, y: b.anchor.y + 0.3, text: String(b.key), anchor: 'middle', baseline: 'middle' }, x, y, { size: 6.5, weight: 'semibold', color: '#ffffff' });
  }
  if (plot.dominanceLine) layout.label(plot.dominanceLine.label, x, y, { size: 7, color: INK.caution }, INK.paper);
  for (const o of plot.offPlot) layout.label(o.label, x, y, { size: 7, color: INK.muted });
}

export function drawStep(layout: Layout, plot: StepPlot, x: number, y: number): void {
  const { doc } = layout;
  axes(layout, plot, x, y);
  doc.save();
  doc.translate(x, y);
  doc.save();
  doc.path(plot.framePath).clip();
  if (plot.bandPath) doc.path(plot.bandPath).fillOpacity(0.55).fill(INK.accentSoft);
  doc.fillOpacity(1);
  if (plot.bandEdgesPath) doc.path(plot.bandEdgesPath).lineWidth(0.5).strokeColor(INK.accent).stroke();
  if (plot.finalValuePath) {
    doc.path(plot.finalValuePath).lineWidth(0.6).strokeColor(INK.muted).dash(1.5, { space: 2 }).stroke();
    doc.undash();
  }
  for (const g of plot.guides) {
    const color = g.kind === 'ceiling' ? INK.caution : INK.faint;
    doc.path(g.d).lineWidth(0.8).strokeColor(color);
    if (g.kind !== 'rise') doc.dash(4, { space: 3 });
    doc.stroke();
    doc.undash();
  }
  doc.path(plot.responsePath).lineWidth(1.4).strokeColor(INK.accentStrong).stroke();
  doc.restore();
  doc.restore();
  for (const g of plot.guides) layout.label(g.label, x, y, { size: 7, color: g.kind === 'ceiling' ? INK.caution : INK.muted });
  if (plot.bandLabel) layout.label(plot.bandLabel, x, y, { size: 7, color: INK.accent });
}
