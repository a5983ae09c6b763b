export { splanePlot, type SplanePlot, type SplanePlotInput, type RegionInput, type BoundaryPath, type RootMark, type OffPlotMark } from './splane-plot.js';
export { splaneViewport, type SplaneViewportInput } from './splane-viewport.js';
export { stepPlot, type StepPlot, type StepPlotInput, type Guide } from './step-plot.js';
export { plotFrame, DEFAULT_MARGIN } from './plot-frame.js';
export { axisTicks, formatTick, type RoundTicks } from './axis-ticks.js';
export { polylinePath } from './polyline-path.js';
export { crossPath, circlePath, arrowPath, rectPath } from './mark-paths.js';
export { formatValue } from './format-value.js';
export type { Axis, Complex, Frame, Label, Margin, Point, SampledPoint, Tick, Viewport } from './types.js';
