import { parseDesign, regionBounds, regionPolygons, sampleStepResponse, type Assessment, type RegionBounds, type RegionPlot } from '@polecourt/spec';

import { reportViewport } from './report-pdf.js';

/**
 * The engine output both plots need: the region's bounds and polygons for
 * the plot's own viewport, and the step response sampled over a window that
 * shows the settling and every time limit.
 */
export function reportFigures(design: unknown, requirements: Record<string, number>, result: Assessment): { bounds: RegionBounds; region: RegionPlot; step: { t: number[]; y: number[] } } {
  const bounds = regionBounds(requirements);
  const viewport = reportViewport({
    poles: result.poles,
    zeros: result.zeros,
    dominantPoles: result.dominant?.poles ?? [],
    dominanceRatio: bounds.dominanceRatio,
    minDecayRate: bounds.minDecayRate,
    minDampedFrequency: bounds.minDampedFrequency,
    maxNaturalFrequency: bounds.maxNaturalFrequency,
  });
  const region = regionPolygons(bounds, viewport);
  const model = parseDesign(design);
  const limits = [requirements.maxSettlingTime, requirements.maxPeakTime].filter((v): v is number => typeof v === 'number' && v > 0);
  const settled = result.metrics ? result.metrics.settlingTime * 1.5 : 0;
  const tEnd = result.stable && (limits.length > 0 || settled > 0) ? Math.max(settled, ...limits.map((v) => v * 1.2)) : undefined;
  const sampled = sampleStepResponse(model, { ...(tEnd !== undefined && tEnd > 0 ? { tEnd } : {}), maxPoints: 400 });
  return { bounds, region, step: { t: sampled.t, y: sampled.y } };
}
