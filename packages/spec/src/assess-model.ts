import { buildChecks, type CheckInputs } from './build-checks.js';
import { dcGain } from './dc-gain.js';
import { findDominance } from './find-dominance.js';
import { stability } from './is-stable.js';
import type { ResolvedRequirements } from './parse-requirements.js';
import { regionSlack } from './region-slack.js';
import { secondOrderEstimate } from './second-order-estimate.js';
import { computeStepMetrics } from './step-metrics.js';
import { tightenLimits } from './tighten-limits.js';
import type { Assessment, Check, Dominance, Estimate, Model, StepMetrics } from './types.js';
import { ENGINE_VERSION } from './version.js';

// One assessment of a checked model against checked requirements (or none):
// stability, DC gain, exact step metrics, the dominant pole(s) and their
// second-order estimate, region membership, checks and verdict. The verdict
// is compliant only when the model is stable and no check fails on the exact
// metrics (an n/a peak-time check does not fail).

// When a second-order estimate is far enough from the exact value to mislead
// (common practice, no source): 2 points of overshoot, 15 % of a time.
const OVERSHOOT_POINTS = 2;
const TIME_FRACTION = 0.15;

function fmt(x: number): string {
  return String(Number(x.toPrecision(3)));
}

function estimateNotes(metrics: StepMetrics, estimate: Estimate): string[] {
  const notes: string[] = [];
  if (estimate.overshootPct !== null) {
    const d = estimate.overshootPct - metrics.overshootPct;
    if (Math.abs(d) >= OVERSHOOT_POINTS) {
      notes.push(
        `the second-order estimate of overshoot is off by ${fmt(Math.abs(d))} points (${fmt(estimate.overshootPct)} % against ${fmt(metrics.overshootPct)} % exact)`,
      );
    }
  }
  const times: [string, number | null, number | null][] = [
    ['peak time', estimate.peakTime, metrics.peakTime],
    ['settling time', estimate.settlingTime, metrics.settlingTime],
    ['rise time', estimate.riseTime, metrics.riseTime],
  ];
  for (const [name, est, exact] of times) {
    if (est !== null && exact !== null && exact > 0) {
      const rel = (est - exact) / exact;
      if (Math.abs(rel) >= TIME_FRACTION) {
        notes.push(
          `the second-order estimate of ${name} is off by ${fmt(Math.abs(rel) * 100)} % (${fmt(est)} s against ${fmt(exact)} s exact)`,
        );
      }
    }
  }
  if (estimate.peakTime !== null && metrics.peakTime === null) {
    notes.push(`the second-order estimate puts a peak at ${fmt(estimate.peakTime)} s, but the exact response does not overshoot`);
  } else if (estimate.peakTime === null && metrics.peakTime !== null) {
    notes.push(`the exact response overshoots by ${fmt(metrics.overshootPct)} % although the dominant pole is real`);
  }
  return notes;
}

const LIMIT_NAME: Record<string, string> = {
  maxOvershootPct: 'overshoot limit',
  maxSettlingTime: 'settling-time limit',
  maxPeakTime: 'peak-time limit',
  maxRiseTime: 'rise-time limit',
};

function disagreementNotes(checks: Check[], req: ResolvedRequirements): string[] {
  const limits = tightenLimits(req);
  const notes: string[] = [];
  for (const c of checks) {
    if (c.estimate === null || c.value === null || c.status === 'n/a') continue;
    const limit = limits[c.requirement as keyof typeof limits];
    if (limit === undefined || c.requirement === 'minDampingRatio' || c.requirement === 'maxNaturalFrequency') continue;
    const estimatePasses = c.estimate <= limit;
    if (estimatePasses !== (c.status === 'pass')) {
      notes.push(
        `judged by the second-order estimate the ${LIMIT_NAME[c.requirement] ?? c.requirement} would ${estimatePasses ? 'pass' : 'fail'}, but the exact response ${c.status === 'pass' ? 'passes' : 'fails'} it`,
      );
    }
  }
  return notes;
}

export function assessModel(model: Model, req: ResolvedRequirements | null): Assessment {
  const band = req?.settlingBandPct ?? 2;
  const stab = stability(model);
  const dominance: Dominance = findDominance(model, req?.dominanceRatio ?? 5);
  const notes: string[] = [];
  let metrics: StepMetrics | null = null;
  let estimate: Estimate | null = null;
  let metricsReason: string | undefined;
  if (stab.stable) {
    const result = computeStepMetrics(model, band);
    metrics = result.metrics;
    notes.push(...result.notes);
    if (metrics === null) metricsReason = result.notes.join('; ') || undefined;
    estimate = secondOrderEstimate(dominance, band);
  } else {
    notes.push(`the model is not stable: ${stab.reason ?? 'a pole does not decay'}`);
  }
  const dominant: Dominance | null = dominance.poles.length > 0 ? dominance : null;

  let checks: Check[] = [];
  if (req !== null) {
    // Built without object spreads: this runs for every design of a batch.
    const inputs: CheckInputs = { requirements: req, stable: stab.stable, metrics, dominance: dominant, estimate };
    if (stab.reason !== null) inputs.stabilityReason = stab.reason;
    if (metricsReason !== undefined) inputs.metricsReason = metricsReason;
    checks = buildChecks(inputs);
  }
  if (dominant !== null && metrics !== null && estimate !== null) {
    dominant.notes.push(...estimateNotes(metrics, estimate));
    if (req !== null) dominant.notes.push(...disagreementNotes(checks, req));
  }

  const pole = dominant?.poles[0];
  const regionPass = req === null ? null : stab.stable && pole !== undefined && regionSlack(pole, req).inside;
  const verdict = req === null ? null : stab.stable && checks.every((c) => c.status !== 'fail') ? 'compliant' : 'noncompliant';

  const assessment: Assessment = {
    id: model.id,
    stable: stab.stable,
    dcGain: dcGain(model),
    poles: model.poles,
    zeros: model.zeros,
    metrics,
    dominant,
    estimate,
    regionPass,
    checks,
    verdict,
    notes,
    engineVersion: ENGINE_VERSION,
  };
  // id stays undefined without one (JSON leaves it out); no delete, which would slow the object down.
  return assessment;
}
