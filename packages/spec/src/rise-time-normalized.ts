import { standardStepCrossing } from './standard-step-crossing.js';

// Exact normalized 10-90 % rise time omega_n * Tr of the standard second-order
// step response: the first 90 % crossing minus the first 10 % crossing, each
// found by bracketed root finding on the analytic response (underdamped,
// critically damped and overdamped forms). Defined for zeta >= 0.
export function riseTimeNormalized(dampingRatio: number): number {
  return standardStepCrossing(dampingRatio, 0.9) - standardStepCrossing(dampingRatio, 0.1);
}
