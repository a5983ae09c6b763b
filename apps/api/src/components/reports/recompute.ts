import type { RecomputeResult, RecomputedCheck } from '@polecourt/contracts';
import { ENGINE_VERSION, evaluate, type Assessment } from '@polecourt/spec';

import type { Attachment } from './pdf-attachments.js';
import type { ReportEvidence } from './report-content.js';

// Re-evaluates the inputs embedded in a report with the engine running now
// and compares, number by number, with the result stored in the report. The
// engine refines every time to better than 1e-6 relative, so agreement is
// judged at that precision; a different engine version is reported with the
// size of any difference.

const TOLERANCE = 1e-6;

function relative(a: number | null | undefined, b: number | null | undefined): number | null {
  if (a === null || a === undefined || b === null || b === undefined || !Number.isFinite(a) || !Number.isFinite(b)) return null;
  return Math.abs(b - a) / Math.max(Math.abs(a), 1e-12);
}

function isEvidence(x: unknown): x is ReportEvidence {
  const e = x as Partial<ReportEvidence> | null;
  return !!e && e.kind === 'polecourt.compliance-report.evidence' && !!e.candidate?.design && !!e.revision?.requirements && !!e.result;
}

export function recompute(attachments: Attachment[]): RecomputeResult {
  let evidence: ReportEvidence | null = null;
  for (const a of attachments) {
    try {
      const parsed: unknown = JSON.parse(a.data.toString('utf8'));
      if (isEvidence(parsed)) {
        evidence = parsed;
        break;
      }
    } catch {
      /* not JSON: look at the next one */
    }
  }
  if (!evidence) return { available: false, reason: 'The file carries no Polecourt evidence (the embedded inputs), so nothing could be recomputed.' };

  let now: Assessment;
  try {
    now = evaluate(evidence.candidate.design, evidence.revision.requirements);
  } catch (err) {
    return { available: false, reason: `The embedded inputs could not be evaluated: ${err instanceof Error ? err.message : String(err)}` };
  }
  const then = evidence.result;
  const checks: RecomputedCheck[] = then.checks.map((c) => {
    const n = now.checks.find((x) => x.requirement === c.requirement);
    return {
      requirement: c.requirement,
      stored: c.value,
      now: n?.value ?? null,
      relativeDifference: relative(c.value, n?.value),
      storedStatus: c.status,
      nowStatus: n?.status ?? 'missing',
    };
  });
  const metricKeys = ['finalValue', 'overshootPct', 'undershootPct', 'peakTime', 'settlingTime', 'riseTime'] as const;
  const diffs = [
    ...checks.map((c) => c.relativeDifference),
    ...metricKeys.map((k) => relative(then.metrics?.[k] ?? null, now.metrics?.[k] ?? null)),
  ].filter((d): d is number => d !== null);
  const maxRelativeDifference = diffs.length ? Math.max(...diffs) : 0;
  const sameShape = checks.length === now.checks.length && checks.every((c) => c.storedStatus === c.nowStatus) && then.stable === now.stable;
  const engineVersionThen = evidence.assessment.engineVersion;
  return {
    available: true,
    engineVersionThen,
    engineVersionNow: ENGINE_VERSION,
    sameEngine: engineVersionThen === ENGINE_VERSION,
    verdictThen: then.verdict,
    verdictNow: now.verdict,
    agrees: sameShape && then.verdict === now.verdict && maxRelativeDifference <= TOLERANCE,
    maxRelativeDifference,
    checks,
  };
}
