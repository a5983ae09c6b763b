import { Link } from 'react-router-dom';

import { ErrorPanel } from '@/components/errors/error-panel';
import { Alert } from '@/components/ui/alert';
import { Loading } from '@/components/ui/loading';

import { useCandidates } from '../api/get-candidates';
import { CandidatesTable } from './candidates-table';

/** The candidates of one product line, with the ways to add more for those who may. */
export function ProductLineCandidates({ productLineId, canSubmit }: { productLineId: number; canSubmit: boolean }) {
  const candidates = useCandidates({ productLineId });

  return (
    <section aria-labelledby="candidates-heading" className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="candidates-heading" className="text-lg font-semibold">
          Candidates
        </h2>
        {canSubmit && (
          <div className="flex flex-wrap gap-2">
            <Link
              to={`/product-lines/${productLineId}/candidates/new`}
              className="inline-flex items-center rounded border border-accent bg-accent px-4 py-2 text-sm font-medium text-paper-raised hover:bg-accent-strong"
            >
              Enter a candidate
            </Link>
            <Link
              to={`/product-lines/${productLineId}/candidates/upload`}
              className="inline-flex items-center rounded border border-rule-strong bg-paper-raised px-4 py-2 text-sm font-medium text-ink hover:border-ink-muted"
            >
              Upload a file
            </Link>
          </div>
        )}
      </div>
      {candidates.isPending ? (
        <Loading label="Loading the candidates…" />
      ) : candidates.isError ? (
        <ErrorPanel error={candidates.error} title="The candidates could not be loaded" onRetry={() => void candidates.refetch()} />
      ) : candidates.data.items.length === 0 ? (
        <Alert tone="info" title="No candidate for this product line yet">
          <p>
            {canSubmit
              ? 'Enter one by hand or upload a JSON or CSV file with several.'
              : 'When a controls engineer submits one, it is listed here with its assessments.'}
          </p>
        </Alert>
      ) : (
        <>
          {candidates.data.total > candidates.data.items.length && (
            <Alert tone="caution" title="Not every candidate is listed">
              <p>
                The first {candidates.data.items.length} of {candidates.data.total} are shown. The coverage page and its CSV export include all of them.
              </p>
            </Alert>
          )}
          <CandidatesTable candidates={candidates.data.items} />
        </>
      )}
    </section>
  );
}
