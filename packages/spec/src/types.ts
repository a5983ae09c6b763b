// Shared shapes of the engine contract. Field names are stable: the API, the
// web client, the PDF reports and outside pipelines all read them.

export interface Complex {
  re: number;
  im: number;
}

/** One revision's limits. Every field optional; at least one limit present. */
export interface Requirements {
  maxOvershootPct?: number;
  maxSettlingTime?: number;
  settlingBandPct?: number;
  maxPeakTime?: number;
  maxRiseTime?: number;
  minDampingRatio?: number;
  maxNaturalFrequency?: number;
  dominanceRatio?: number;
  marginPct?: number;
}

export interface ZpkDesignInput {
  id?: string;
  poles: Complex[];
  zeros?: Complex[];
  gain: number;
}

export interface PolynomialDesignInput {
  id?: string;
  numerator: number[];
  denominator: number[];
}

export type DesignInput = ZpkDesignInput | PolynomialDesignInput;

/**
 * A checked, normalised closed-loop model: both forms filled in.
 * G(s) = gain * prod(s - z) / prod(s - p) = numerator(s) / denominator(s),
 * denominator monic (leading coefficient 1), coefficients highest power first.
 * Poles and zeros sorted by real part descending (slowest first), conjugates
 * adjacent with the positive imaginary part first, exact conjugates enforced.
 */
export interface Model {
  id?: string;
  form: 'zpk' | 'polynomial';
  poles: Complex[];
  zeros: Complex[];
  gain: number;
  numerator: number[];
  denominator: number[];
}

export interface StepMetrics {
  finalValue: number;
  overshootPct: number;
  undershootPct: number;
  peakTime: number | null;
  settlingTime: number;
  settlingBandPct: number;
  riseTime: number | null;
}

export interface Dominance {
  poles: Complex[];
  dampingRatio: number | null;
  naturalFrequency: number | null;
  ratio: number | null;
  zeroRatio: number | null;
  approximationValid: boolean;
  notes: string[];
}

export interface Estimate {
  overshootPct: number | null;
  peakTime: number | null;
  settlingTime: number | null;
  riseTime: number | null;
}

export type CheckStatus = 'pass' | 'fail' | 'n/a';

export interface Check {
  requirement: keyof Requirements;
  limit: number;
  /** The limit tightened by the requirement set's marginPct: what the status compares with. */
  effectiveLimit?: number;
  value: number | null;
  estimate: number | null;
  status: CheckStatus;
  marginPct: number | null;
  reason?: string;
}

export interface Assessment {
  id?: string;
  stable: boolean;
  dcGain: number | null;
  poles: Complex[];
  zeros: Complex[];
  metrics: StepMetrics | null;
  dominant: Dominance | null;
  estimate: Estimate | null;
  regionPass: boolean | null;
  checks: Check[];
  verdict: 'compliant' | 'noncompliant' | null;
  notes: string[];
  engineVersion: string;
}
