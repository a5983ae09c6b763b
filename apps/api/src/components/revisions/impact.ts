import type { Transaction } from 'sequelize';

import type { ImpactAcknowledgement, ImpactRow, RevisionImpact } from '@polecourt/contracts';
import { ENGINE_VERSION, evaluateBatch, type Check } from '@polecourt/spec';

import { latestResultsFor } from '../assessments/repository.js';
import { candidateRepository, type CandidateDesign } from '../candidates/repository.js';
import type { RevisionRecord } from './repository.js';
import { requirementsSha256 } from './requirements-sha256.js';

type Outcome = ImpactRow['proposed'];

// Outcomes already computed, keyed by candidate and requirements hash. A
// candidate never changes after it is saved and the engine version is fixed
// for the life of the process, so an entry never goes stale; the oldest are
// dropped beyond the cap. Impact is asked for again and again while a draft is
// reviewed (and once more at approval), and the engine is the slow part.
const MEMO_CAP = 50_000;
const memo = new Map<string, Outcome>();

/** Empties the memo (the speed bench uses it to time a cold call). */
export function forgetImpactMemo(): void {
  memo.clear();
}

function remember(key: string, outcome: Outcome): void {
  if (memo.size >= MEMO_CAP) memo.delete(memo.keys().next().value!);
  memo.set(key, outcome);
}

function toOutcome(r: { verdict?: string | null; checks?: unknown } | { error: { message: string } }): Outcome {
  return 'error' in r ? { error: r.error.message } : { verdict: r.verdict ?? 'noncompliant', checks: (r.checks ?? []) as Check[] };
}

/**
 * One outcome per candidate against one revision: from the memo, else from a
 * stored assessment of this revision made by this engine version, else from
 * one engine batch (requirements parsed once; a bad stored design yields its
 * error in place and the rest go on).
 */
async function outcomes(candidates: CandidateDesign[], revision: RevisionRecord, t?: Transaction): Promise<Outcome[]> {
  const sha = revision.sha256 ?? requirementsSha256(revision.requirements);
  const keys = candidates.map((c) => `${c.id}:${sha}`);
  const result: (Outcome | undefined)[] = keys.map((k) => memo.get(k));
  let missing = candidates.map((_, i) => i).filter((i) => result[i] === undefined);
  if (missing.length && revision.sha256) {
    const stored = await latestResultsFor(revision.id, missing.map((i) => candidates[i]!.id), t);
    for (const i of missing) {
      const s = stored.get(candidates[i]!.id);
      if (s && s.engineVersion === ENGINE_VERSION && s.revisionSha256 === revision.sha256) result[i] = toOutcome(s.result as { verdict: string; checks: unknown });
    }
    missing = missing.filter((i) => result[i] === undefined);
  }
  if (missing.length) {
    const fresh = evaluateBatch(
      missing.map((i) => candidates[i]!.design),
      revision.requirements,
    );
    missing.forEach((i, j) => {
      result[i] = toOutcome(fresh[j]!);
    });
  }
  return result.map((o, i) => {
    remember(keys[i]!, o!);
    return o!;
  });
}

const verdictOf = (o: Outcome | null): string | null => (o === null ? null : 'error' in o ? 'error' : o.verdict);

/**
 * Every candidate of the product line against `revision` and against the
 * baseline (the approved revision it would replace, if another one), rows
 * whose verdict changes first, then by name.
 */
export async function computeImpact(
  revision: RevisionRecord,
  productLineId: number,
  baseline: RevisionRecord | null,
  transaction?: Transaction,
): Promise<RevisionImpact> {
  const candidates = await candidateRepository.designsByLine(productLineId, transaction);
  const proposed = await outcomes(candidates, revision, transaction);
  const current = baseline ? await outcomes(candidates, baseline, transaction) : null;
  const items: ImpactRow[] = candidates.map((c, i) => {
    const p = proposed[i]!;
    const cur = current ? current[i]! : null;
    return { candidateId: c.id, name: c.name, proposed: p, current: cur, changed: verdictOf(p) !== verdictOf(cur) };
  });
  items.sort((a, b) => Number(b.changed) - Number(a.changed) || a.name.localeCompare(b.name) || a.candidateId - b.candidateId);
  return {
    revisionId: revision.id,
    baselineRevisionId: baseline?.id ?? null,
    total: items.length,
    changedCount: items.filter((r) => r.changed).length,
    items,
  };
}

/** What the approver acknowledged: who changes verdict, kept on the revision for good. */
export function acknowledgement(impact: RevisionImpact, at: Date): ImpactAcknowledgement {
  return {
    acknowledgedAt: at.toISOString(),
    baselineRevisionId: impact.baselineRevisionId,
    total: impact.total,
    changed: impact.items
      .filter((r) => r.changed)
      .map((r) => ({ candidateId: r.candidateId, name: r.name, from: verdictOf(r.current), to: verdictOf(r.proposed) ?? 'error' })),
  };
}
