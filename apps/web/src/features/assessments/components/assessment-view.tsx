import type { StoredAssessment } from '@polecourt/contracts';
import type { Assessment, Requirements } from '@polecourt/spec';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';

import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { SplanePlot } from '@/components/plots/splane-plot';
import { SafetyCaution } from '@/components/safety-caution';
import { Alert } from '@/components/ui/alert';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { VerdictBadge } from '@/components/verdict-badge';
import { formatNumber, formatQuantity } from '@/lib/format';
import { formatDateTime } from '@/utils/format-date-time';

import { useAssessedCandidate } from '../api/get-assessed-candidate';
import { useAssessment } from '../api/get-assessment';
import { useRequirementSet } from '../api/get-requirement-set';
import { useRevision } from '../api/get-revision';
import { ChecksTable } from './checks-table';
import { DominancePanel } from './dominance-panel';
import { StepResponsePanel } from './step-response-panel';

function Panel({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="flex min-w-0 flex-col gap-3 rounded border border-rule bg-paper-raised p-4">
      <h2 id={id} className="text-base font-semibold">
        {title}
      </h2>
      {children}
    </section>
  );
}

function plotFallback(title: string) {
  return function Fallback({ error, reset }: { error: unknown; reset: () => void }) {
    return <ErrorPanel error={error} title={title} onRetry={reset} />;
  };
}

/** Why an unstable or marginal model has no metrics, in the engine's words. */
function instabilityReason(result: Assessment): string {
  const note = result.notes.find((n) => n.startsWith('the model is not stable'));
  const text = note ?? result.checks.find((c) => c.reason)?.reason ?? 'the model is not stable';
  return text.charAt(0).toUpperCase() + text.slice(1);
}

function RecordFacts({ stored, revisionNumber, setName, setId }: { stored: StoredAssessment; revisionNumber: number | null; setName: string | null; setId: number | null }) {
  return (
    <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-2 text-sm">
      <dt className="font-medium">Revision cited</dt>
      <dd>
        {revisionNumber === null ? `revision id ${stored.revisionId}` : `Revision ${revisionNumber}`}
        {setName && (
          <>
            {' of '}
            {setId !== null ? <span className="font-medium">{setName}</span> : setName}
          </>
        )}
        {stored.revisionStatus === 'retired' && <span className="ml-2 font-semibold text-caution">(retired since)</span>}
      </dd>
      <dt className="font-medium">Revision SHA-256</dt>
      <dd>
        <code className="break-all text-xs" data-revision-sha256="">
          {stored.revisionSha256}
        </code>
      </dd>
      <dt className="font-medium">Engine version</dt>
      <dd>
        <code className="text-xs">{stored.engineVersion}</code>
      </dd>
      <dt className="font-medium">Assessed</dt>
      <dd>
        <time dateTime={stored.createdAt}>{formatDateTime(stored.createdAt)}</time> by {stored.createdBy.name}
      </dd>
    </dl>
  );
}

/**
 * One assessment: the verdict, the s-plane plot and the exact step response (each in its own
 * error boundary), the checks, whether dominance holds, the revision and engine it was made
 * with, and the caution that a compliant model is not a safety case.
 */
export function AssessmentView({ assessmentId, actions, children }: { assessmentId: number; actions?: ReactNode; children?: ReactNode }) {
  const assessment = useAssessment({ id: assessmentId });
  const stored = assessment.data;
  const revision = useRevision({ id: stored?.revisionId ?? 0, enabled: Boolean(stored) });
  const candidate = useAssessedCandidate({ id: stored?.candidateId ?? 0, enabled: Boolean(stored) });
  const set = useRequirementSet({ id: revision.data?.requirementSetId ?? 0, enabled: Boolean(revision.data) });

  if (assessment.isPending) return <Loading label="Loading the assessment…" />;
  if (assessment.isError) {
    return (
      <>
        <PageHeader title="Assessment" />
        <ErrorPanel error={assessment.error} title="The assessment could not be loaded" onRetry={() => void assessment.refetch()} />
      </>
    );
  }

  const s = assessment.data;
  const result = s.result as unknown as Assessment;
  const verdict = result.verdict ?? 'noncompliant';
  const requirements = (revision.data?.requirements ?? null) as Requirements | null;
  const candidateName = candidate.data?.name ?? `candidate ${s.candidateId}`;
  const revisionNumber = revision.data?.number ?? null;
  const setName = set.data?.name ?? null;
  const retired = s.revisionStatus === 'retired';

  return (
    <div className="flex flex-col gap-6" data-assessment-id={s.id}>
      <title>{`Assessment of ${candidateName} · Polecourt`}</title>
      <PageHeader
        title={`Assessment of ${candidateName}`}
        lead={
          <>
            <Link to={`/candidates/${s.candidateId}`} className="text-accent underline underline-offset-2 hover:decoration-2">
              {candidateName}
            </Link>{' '}
            against {revisionNumber === null ? 'its revision' : `revision ${revisionNumber}`}
            {setName ? ` of ${setName}` : ''}, <time dateTime={s.createdAt}>{formatDateTime(s.createdAt)}</time>.
          </>
        }
        actions={actions}
      />

      <section aria-labelledby="verdict-heading" className="flex flex-col gap-3">
        <h2 id="verdict-heading" className="sr-only">
          Verdict
        </h2>
        <div className="flex flex-wrap items-center gap-4">
          <VerdictBadge verdict={verdict} size="lg" />
          <p className="max-w-prose text-sm">
            {verdict === 'compliant'
              ? 'Every check passes on the exact step response of the whole model.'
              : result.stable
                ? `${result.checks.filter((c) => c.status === 'fail').length} of ${result.checks.length} checks fail on the exact step response.`
                : 'The model is not stable, so every check fails.'}
          </p>
        </div>
        {retired && (
          <Alert tone="caution" title="Made against a revision that is now retired">
            <p>
              Revision {revisionNumber ?? s.revisionId} has been replaced since this assessment was made. The verdict holds for that revision only; assess the candidate
              again against the approved revision in force.
            </p>
          </Alert>
        )}
        {!result.stable && (
          <Alert tone="error" title="No step-response metrics: the model is not stable">
            <p>{instabilityReason(result)}. A model that does not settle has no overshoot, settling, peak or rise time, so every check fails.</p>
          </Alert>
        )}
      </section>

      <SafetyCaution />

      <div className="grid gap-6 xl:grid-cols-2">
        <Panel id="splane-heading" title="s-plane: admissible region and poles">
          {revision.isPending ? (
            <Loading label="Loading the revision’s limits…" />
          ) : revision.isError ? (
            <ErrorPanel error={revision.error} title="The revision could not be loaded" onRetry={() => void revision.refetch()} />
          ) : (
            <ErrorBoundary fallback={plotFallback('The s-plane plot could not be drawn')}>
              <SplanePlot
                title={`Admissible region of revision ${revisionNumber ?? ''} with the poles and zeros of ${candidateName}`}
                requirements={requirements}
                poles={result.poles}
                zeros={result.zeros}
                dominantPoles={result.dominant?.poles ?? []}
                dominanceRatio={requirements?.dominanceRatio ?? 5}
                caption="Poles x, zeros o; the dominant pole or pair is ringed. The dashed vertical line is the dominance threshold."
              />
            </ErrorBoundary>
          )}
        </Panel>

        <Panel id="step-heading" title="Step response (exact)">
          {candidate.isPending || revision.isPending ? (
            <Loading label="Loading the model…" />
          ) : candidate.isError ? (
            <ErrorPanel error={candidate.error} title="The candidate’s model could not be loaded" onRetry={() => void candidate.refetch()} />
          ) : revision.isError ? (
            <ErrorPanel error={revision.error} title="The revision could not be loaded" onRetry={() => void revision.refetch()} />
          ) : (
            <ErrorBoundary fallback={plotFallback('The step-response plot could not be drawn')}>
              <StepResponsePanel
                design={candidate.data.design}
                requirements={requirements ?? {}}
                finalValue={result.metrics?.finalValue ?? result.dcGain}
                stable={result.stable}
              />
            </ErrorBoundary>
          )}
        </Panel>
      </div>

      <Panel id="checks-heading" title="Checks">
        <ChecksTable checks={result.checks} marginPct={requirements?.marginPct ?? null} />
        {result.metrics && (
          <p className="text-xs text-ink-muted">
            Final value {formatNumber(result.metrics.finalValue)}; undershoot {formatQuantity(result.metrics.undershootPct, '%')}; settling band ±
            {formatNumber(result.metrics.settlingBandPct)} %. Margin: how far inside the written limit the exact value is, in percent of the limit.
          </p>
        )}
        {result.notes.length > 0 && result.stable && (
          <ul className="ml-5 list-disc text-sm">
            {result.notes.map((n, i) => (
              <li key={i}>{n.charAt(0).toUpperCase() + n.slice(1)}</li>
            ))}
          </ul>
        )}
      </Panel>

      <Panel id="dominance-heading" title="Second-order view">
        <DominancePanel dominant={result.dominant} dominanceRatio={requirements?.dominanceRatio ?? 5} regionPass={result.regionPass} />
      </Panel>

      <Panel id="record-heading" title="Record">
        <RecordFacts stored={s} revisionNumber={revisionNumber} setName={setName} setId={revision.data?.requirementSetId ?? null} />
      </Panel>

      {children}
    </div>
  );
}
