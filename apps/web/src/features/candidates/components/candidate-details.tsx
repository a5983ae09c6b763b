import type { Candidate } from '@polecourt/contracts';
import { type Model, parseDesign } from '@polecourt/spec';
import { useMemo } from 'react';

import { ErrorPanel } from '@/components/errors/error-panel';
import { ErrorBoundary } from '@/components/errors/error-boundary';
import { Alert } from '@/components/ui/alert';
import { Loading } from '@/components/ui/loading';
import { formatComplex, formatNumber } from '@/lib/format';
import { formatDateTime } from '@/utils/format-date-time';

import { useCandidate } from '../api/get-candidate';
import { formOf } from './candidates-table';
import { PoleZeroPreview } from './pole-zero-preview';

function polynomialText(coefficients: readonly number[]): string {
  return coefficients.map((c) => formatNumber(c)).join(', ');
}

function RootList({ roots, none }: { roots: readonly { re: number; im: number }[]; none: string }) {
  if (roots.length === 0) return <span className="text-ink-muted">{none}</span>;
  return (
    <ul className="flex flex-wrap gap-x-4 gap-y-1 tabular-nums">
      {roots.map((r, i) => (
        <li key={i}>{formatComplex(r)}</li>
      ))}
    </ul>
  );
}

function ModelFacts({ candidate }: { candidate: Candidate }) {
  const form = formOf(candidate.design);
  const model = useMemo<Model | null>(() => {
    try {
      return parseDesign(candidate.design);
    } catch {
      return null;
    }
  }, [candidate.design]);

  if (!model) {
    return (
      <Alert tone="error" title="The stored model could not be read">
        <p>The browser’s copy of the engine refused this design. The server’s assessments still show what it computed.</p>
      </Alert>
    );
  }
  return (
    <div className="grid gap-6 md:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-2 text-sm">
        <dt className="font-medium">Given as</dt>
        <dd>{form === 'zpk' ? 'zero-pole-gain' : 'polynomial coefficients (highest power of s first)'}</dd>
        {form === 'polynomial' && (
          <>
            <dt className="font-medium">Numerator</dt>
            <dd className="tabular-nums">{polynomialText((candidate.design.numerator as number[] | undefined) ?? [])}</dd>
            <dt className="font-medium">Denominator</dt>
            <dd className="tabular-nums">{polynomialText((candidate.design.denominator as number[] | undefined) ?? [])}</dd>
          </>
        )}
        <dt className="font-medium">Poles (1/s)</dt>
        <dd>
          <RootList roots={model.poles} none="none" />
          {form === 'polynomial' && <span className="mt-1 block text-xs text-ink-muted">roots of the denominator, computed in your browser</span>}
        </dd>
        <dt className="font-medium">Zeros (1/s)</dt>
        <dd>
          <RootList roots={model.zeros} none="none" />
        </dd>
        <dt className="font-medium">Gain</dt>
        <dd className="tabular-nums">{formatNumber(model.gain)}</dd>
        {form === 'zpk' && (
          <>
            <dt className="font-medium">Denominator</dt>
            <dd className="tabular-nums text-ink-muted">{polynomialText(model.denominator)}</dd>
          </>
        )}
      </dl>
      <ErrorBoundary fallback={({ error, reset }) => <ErrorPanel error={error} title="The pole-zero map could not be drawn" onRetry={reset} />}>
        <PoleZeroPreview poles={model.poles} zeros={model.zeros} width={340} height={240} title={`Pole-zero map of ${candidate.name}`} />
      </ErrorBoundary>
    </div>
  );
}

/** A candidate's facts and its model, formatted. */
export function CandidateDetails({ candidateId }: { candidateId: number }) {
  const candidate = useCandidate({ id: candidateId });
  if (candidate.isPending) return <Loading label="Loading the candidate…" />;
  if (candidate.isError) return <ErrorPanel error={candidate.error} title="The candidate could not be loaded" onRetry={() => void candidate.refetch()} />;
  const c = candidate.data;
  return (
    <section aria-labelledby="model-heading" className="flex flex-col gap-4">
      <p className="text-sm text-ink-muted">
        Submitted by {c.createdBy.name} on <time dateTime={c.createdAt}>{formatDateTime(c.createdAt)}</time>.
      </p>
      {c.notes && <p className="max-w-prose whitespace-pre-line">{c.notes}</p>}
      <h2 id="model-heading" className="text-lg font-semibold">
        Closed-loop model
      </h2>
      <ModelFacts candidate={c} />
    </section>
  );
}
