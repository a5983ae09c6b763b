import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { ErrorPanel } from '@/components/errors/error-panel';
import { Loading } from '@/components/ui/loading';

import { type AuditFilters, filtersToParams, hasFilters } from '../api/audit-filters';
import { auditCsvUrl } from '../api/audit-csv-url';
import { AUDIT_PAGE_SIZE, useAuditEvents } from '../api/get-audit-events';
import { useAuditFacets } from '../api/get-audit-facets';
import { AuditEventsTable } from './audit-events-table';
import { AuditFiltersForm } from './audit-filters-form';
import { ChainCheck } from './chain-check';

/**
 * The audit trail for auditors and administrators: filters, the matching
 * events newest first a page at a time, each openable to its before and
 * after, the chain check and the CSV export of exactly what is filtered.
 */
export function AuditTrailOverview({
  filters,
  page,
  canVerify,
  onChange,
}: {
  filters: AuditFilters;
  page: number;
  canVerify: boolean;
  onChange: (next: { filters: AuditFilters; page: number }) => void;
}) {
  const events = useAuditEvents({ filters, page });
  const facets = useAuditFacets();
  const filtered = hasFilters(filters);

  const total = events.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / AUDIT_PAGE_SIZE));
  const first = total === 0 ? 0 : (page - 1) * AUDIT_PAGE_SIZE + 1;
  const last = Math.min(total, page * AUDIT_PAGE_SIZE);
  const lineNames = new Map((facets.data?.productLines ?? []).map((p) => [p.id, p.name]));
  const lineName = (id: number | null) => (id === null ? null : (lineNames.get(id) ?? null));

  return (
    <div className="flex flex-col gap-6">
      <AuditFiltersForm
        // A new key when the address changes (back, forward), so the form shows what is applied.
        key={JSON.stringify(filtersToParams(filters))}
        filters={filters}
        facets={facets.data}
        facetsNote={facets.isError ? 'The filter choices could not be loaded; the list below still works.' : undefined}
        onApply={(next) => onChange({ filters: next, page: 1 })}
      />

      <section aria-labelledby="audit-events-heading" className="flex flex-col gap-3">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h2 id="audit-events-heading" className="text-lg font-semibold">
            {filtered ? 'Matching events' : 'All events'}
          </h2>
          <div className="flex flex-wrap items-center gap-3">
            <a
              className="rounded border border-rule-strong bg-paper-raised px-2.5 py-1 text-sm font-medium text-accent hover:border-ink-muted"
              href={auditCsvUrl(filters)}
              download
            >
              Export {filtered ? 'these events' : 'the whole trail'} as CSV
            </a>
            <Button size="sm" busy={events.isFetching} onClick={() => void events.refetch()}>
              {events.isFetching ? 'Refreshing…' : 'Refresh'}
            </Button>
          </div>
        </div>

        {events.isPending ? (
          <Loading label="Loading audit events…" />
        ) : events.isError ? (
          <ErrorPanel error={events.error} title="The audit events could not be loaded" onRetry={() => void events.refetch()} />
        ) : events.data.items.length === 0 ? (
          <Alert tone="info" title={page > 1 ? 'No events on this page' : filtered ? 'No event matches these filters' : 'The audit trail is empty'}>
            {page > 1 ? (
              <p>Go back to the first page.</p>
            ) : filtered ? (
              <p>Widen the time range or clear a filter. Nothing is ever removed from the trail, so an empty result means no such event was recorded.</p>
            ) : (
              <p>Every change made in Polecourt is recorded here as it happens.</p>
            )}
            {(page > 1 || filtered) && (
              <Button size="sm" className="mt-3" onClick={() => onChange({ filters: page > 1 ? filters : {}, page: 1 })}>
                {page > 1 ? 'First page' : 'Clear filters'}
              </Button>
            )}
          </Alert>
        ) : (
          <AuditEventsTable events={events.data.items} lineName={lineName} />
        )}

        {total > AUDIT_PAGE_SIZE && (
          <nav aria-label="Pages of audit events" className="flex flex-wrap items-center justify-between gap-3 text-sm">
            <p className="text-ink-muted" aria-live="polite">
              Events {first}–{last} of {total.toLocaleString()}, newest first
            </p>
            <div className="flex gap-2">
              <Button size="sm" disabled={page <= 1} onClick={() => onChange({ filters, page: page - 1 })}>
                Newer events
              </Button>
              <Button size="sm" disabled={page >= pages} onClick={() => onChange({ filters, page: page + 1 })}>
                Older events
              </Button>
            </div>
          </nav>
        )}
      </section>

      {canVerify && <ChainCheck />}

      <p className="max-w-3xl text-sm text-ink-muted">
        The trail is written by the server only: nobody can edit or delete an event. Each event records who did what, when (UTC), and the
        record before and after the change. The CSV export holds the same events with their stored before and after records and hashes;
        cells that a spreadsheet would read as a formula start with a single quote.
      </p>
    </div>
  );
}
