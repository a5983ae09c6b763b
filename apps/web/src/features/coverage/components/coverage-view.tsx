import { COVERAGE_FILTERS, type CoverageFilter, type CoverageRow, type CoverageStatus } from '@polecourt/contracts';
import { Link } from 'react-router-dom';

import { ErrorPanel } from '@/components/errors/error-panel';
import { Alert } from '@/components/ui/alert';
import { Loading } from '@/components/ui/loading';
import { VerdictBadge } from '@/components/verdict-badge';
import { cx } from '@/utils/cx';
import { formatDateTime } from '@/utils/format-date-time';

import { coverageCsvUrl, useCoverage } from '../api/get-coverage';

export const FILTER_WORDS: Record<CoverageFilter, string> = {
  all: 'All',
  never_assessed: 'Never assessed',
  retired_only: 'Assessed only against a retired revision',
  noncompliant: 'Not compliant',
};

function StatusCell({ row }: { row: CoverageRow }) {
  const status: CoverageStatus = row.status;
  if (status === 'compliant' || status === 'noncompliant') return <VerdictBadge verdict={status} />;
  if (status === 'retired_only') return <span className="text-sm font-medium text-caution">Only against a retired revision</span>;
  return <span className="text-sm text-ink-muted">Never assessed</span>;
}

/** Approved revision(s) x every candidate of the line x the latest verdict, filtered, with a CSV export. */
export function CoverageView({ productLineId, filter, onFilterChange }: { productLineId: number; filter: CoverageFilter; onFilterChange: (filter: CoverageFilter) => void }) {
  const coverage = useCoverage({ productLineId, filter });
  const noApproved = coverage.data?.items.some((r) => r.revisionId === null) ?? false;

  return (
    <section aria-labelledby="coverage-heading" className="flex flex-col gap-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <fieldset>
          <legend id="coverage-heading" className="text-sm font-medium">
            Show
          </legend>
          <div className="mt-2 flex flex-wrap gap-2">
            {COVERAGE_FILTERS.map((f) => (
              <label
                key={f}
                className="cursor-pointer rounded border border-rule-strong bg-paper-raised px-3 py-1.5 text-sm has-[:checked]:border-accent has-[:checked]:bg-accent-soft has-[:checked]:font-medium has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-accent"
              >
                <input type="radio" name="coverage-filter" value={f} checked={filter === f} onChange={() => onFilterChange(f)} className="sr-only" />
                {FILTER_WORDS[f]}
              </label>
            ))}
          </div>
        </fieldset>
        <a
          href={coverageCsvUrl({ productLineId, filter })}
          download
          className="inline-flex items-center rounded border border-rule-strong bg-paper-raised px-4 py-2 text-sm font-medium text-ink hover:border-ink-muted"
        >
          Export CSV<span className="sr-only"> of the rows shown</span>
        </a>
      </div>

      {coverage.isPending ? (
        <Loading label="Loading the coverage…" />
      ) : coverage.isError ? (
        <ErrorPanel error={coverage.error} title="The coverage could not be loaded" onRetry={() => void coverage.refetch()} />
      ) : (
        <>
          {noApproved && (
            <Alert tone="info" title="No approved revision yet">
              <p>This product line has no approved revision, so each candidate is listed once without a verdict.</p>
            </Alert>
          )}
          <p className="text-sm text-ink-muted" aria-live="polite">
            {coverage.data.total} {coverage.data.total === 1 ? 'row' : 'rows'}
            {filter !== 'all' && ` (${FILTER_WORDS[filter].toLowerCase()})`}
          </p>
          {coverage.data.items.length === 0 ? (
            <Alert tone="info" title="No row matches">
              <p>{filter === 'all' ? 'This product line has no candidate yet.' : 'No candidate falls under this filter.'}</p>
            </Alert>
          ) : (
            <div className={cx('overflow-x-auto rounded border border-rule bg-paper-raised', coverage.isPlaceholderData && 'opacity-60')}>
              <table className="w-full border-collapse text-left text-sm" data-coverage-table="">
                <caption className="sr-only">Coverage: each candidate against each approved revision, with its latest verdict</caption>
                <thead className="border-b border-rule bg-paper-sunk text-xs uppercase tracking-wide text-ink-muted">
                  <tr>
                    <th scope="col" className="px-4 py-2 font-medium">Candidate</th>
                    <th scope="col" className="px-4 py-2 font-medium">Requirement set and revision</th>
                    <th scope="col" className="px-4 py-2 font-medium">Latest verdict</th>
                    <th scope="col" className="px-4 py-2 font-medium">Assessed</th>
                  </tr>
                </thead>
                <tbody>
                  {coverage.data.items.map((row) => (
                    <tr key={`${row.candidateId}-${row.revisionId ?? 'none'}`} className="border-b border-rule align-top last:border-b-0">
                      <th scope="row" className="px-4 py-2.5 font-normal">
                        <Link to={`/candidates/${row.candidateId}`} className="font-medium text-accent underline underline-offset-2 hover:decoration-2">
                          {row.candidateName}
                        </Link>
                      </th>
                      <td className="px-4 py-2.5">
                        {row.requirementSetName ? `${row.requirementSetName}, revision ${row.revisionNumber}` : <span className="text-ink-muted">no approved revision</span>}
                      </td>
                      <td className="px-4 py-2.5">
                        <StatusCell row={row} />
                      </td>
                      <td className="px-4 py-2.5">
                        {row.assessmentId !== null && row.assessedAt ? (
                          <Link to={`/assessments/${row.assessmentId}`} className="text-accent underline underline-offset-2 hover:decoration-2">
                            <time dateTime={row.assessedAt}>{formatDateTime(row.assessedAt)}</time>
                          </Link>
                        ) : (
                          <span className="text-ink-muted">—</span>
                        )}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
        </>
      )}
    </section>
  );
}
