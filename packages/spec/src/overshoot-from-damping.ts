// Percent overshoot of the standard second-order step response,
// %OS = 100 exp(-zeta pi / sqrt(1 - zeta^2)) for 0 <= zeta < 1, and 0 for
// zeta >= 1 (no oscillation). A negative zeta grows without bound: Infinity.
export function overshootFromDamping(dampingRatio: number): number {
  if (Number.isNaN(dampingRatio)) return Number.NaN;
  if (dampingRatio < 0) return Number.POSITIVE_INFINITY;
  if (dampingRatio >= 1) return 0;
  return 100 * Math.exp((-dampingRatio * Math.PI) / Math.sqrt(1 - dampingRatio * dampingRatio));
}
