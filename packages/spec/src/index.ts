// Public surface of @polecourt/spec: re-exports only.
export { SpecInputError } from './spec-input-error.js';
export { ENGINE_VERSION } from './version.js';
export type * from './types.js';

// schemas shared with the API and the web forms
export { requirementsSchema, requirementMessages, type RequirementsInput } from './schemas/requirements.js';
export { designSchema, zpkDesignSchema, polynomialDesignSchema, complexSchema, type DesignSchemaInput } from './schemas/design.js';

// edge checks
export { parseRequirements, type ResolvedRequirements } from './parse-requirements.js';
export { parseDesign } from './parse-design.js';

// the model
export { polyRoots } from './poly-roots.js';
export { partialFractions, type ModalForm, type ModalTerm } from './partial-fractions.js';
export { stepResponse, type StepResponse } from './step-response.js';
export { stability } from './is-stable.js';
export { dcGain } from './dc-gain.js';
export { computeStepMetrics } from './step-metrics.js';
export { sampleStepResponse } from './sample-step-response.js';
export { findDominance } from './find-dominance.js';

// second-order relations
export { dampingFromOvershoot } from './damping-from-overshoot.js';
export { overshootFromDamping } from './overshoot-from-damping.js';
export { settlingConstant } from './settling-constant.js';
export { riseTimeNormalized } from './rise-time-normalized.js';
export { riseTimeNormalizedFast } from './rise-time-normalized-fast.js';
export { standardStepResponse, type StandardStepPoint } from './standard-step-response.js';
export { secondOrderEstimate } from './second-order-estimate.js';

// the admissible region
export { tightenLimits, type Limits } from './tighten-limits.js';
export { regionBounds, type RegionBounds, type RiseTimeCurvePoint } from './region-bounds.js';
export { regionPolygons, type RegionPlot, type RegionPolygon, type RegionBoundaryLine } from './region-polygons.js';
export type { Box as Viewport } from './region-radial-interval.js';
export { regionSlack, type RegionSlack } from './region-slack.js';

// assessments
export { buildChecks, type CheckInputs } from './build-checks.js';
export { assessModel } from './assess-model.js';
export { evaluate } from './evaluate.js';
export { evaluateBatch, type BatchError } from './evaluate-batch.js';
