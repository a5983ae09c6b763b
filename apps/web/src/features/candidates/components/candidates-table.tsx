import type { Candidate, CandidateAssessmentSummary } from '@polecourt/contracts';
import {
  type ColumnFiltersState,
  type FilterFn,
  type SortingState,
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
} from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';

import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { VerdictBadge } from '@/components/verdict-badge';
import { cx } from '@/utils/cx';
import { formatDateTime } from '@/utils/format-date-time';

/** Where a candidate stands against the line's revisions in force (the same buckets as coverage). */
export type Standing = 'compliant' | 'noncompliant' | 'never_assessed' | 'retired_only';

export function standingOf(latest: readonly CandidateAssessmentSummary[]): Standing {
  if (latest.length === 0) return 'never_assessed';
  const current = latest.filter((s) => s.revisionStatus === 'approved');
  if (current.length === 0) return 'retired_only';
  return current.some((s) => s.verdict === 'noncompliant') ? 'noncompliant' : 'compliant';
}

const STANDING_RANK: Record<Standing, number> = { compliant: 0, noncompliant: 1, retired_only: 2, never_assessed: 3 };

export function formOf(design: Record<string, unknown>): 'zpk' | 'polynomial' {
  return 'denominator' in design || 'numerator' in design ? 'polynomial' : 'zpk';
}

const FORM_WORD = { zpk: 'Zero-pole-gain', polynomial: 'Polynomial' } as const;

const VERDICT_FILTERS = [
  { value: 'all', label: 'Any verdict' },
  { value: 'compliant', label: 'Compliant' },
  { value: 'noncompliant', label: 'Not compliant' },
  { value: 'retired_only', label: 'Assessed only against a retired revision' },
  { value: 'never_assessed', label: 'Never assessed' },
] as const;

const column = createColumnHelper<Candidate>();

const standingFilter: FilterFn<Candidate> = (row, _columnId, value: string) => value === 'all' || standingOf(row.original.latest) === value;

function LatestVerdicts({ latest }: { latest: readonly CandidateAssessmentSummary[] }) {
  if (latest.length === 0) return <span className="text-ink-muted">Never assessed</span>;
  return (
    <ul className="flex flex-col gap-1">
      {latest.map((s) => (
        <li key={s.revisionId} className="flex flex-wrap items-center gap-2">
          <Link to={`/assessments/${s.assessmentId}`} className="text-accent underline underline-offset-2 hover:decoration-2">
            Revision {s.revisionNumber}
          </Link>
          <VerdictBadge verdict={s.verdict} />
          {s.revisionStatus === 'retired' && <span className="text-xs text-ink-muted">(revision retired)</span>}
        </li>
      ))}
    </ul>
  );
}

function SortMark({ direction }: { direction: false | 'asc' | 'desc' }) {
  return (
    <span aria-hidden="true" className={cx('text-[0.7rem]', direction ? 'text-ink' : 'text-ink-faint')}>
      {direction === 'asc' ? '▲' : direction === 'desc' ? '▼' : '↕'}
    </span>
  );
}

/** The candidates of one product line: sortable columns, a text filter and a verdict filter. */
export function CandidatesTable({ candidates }: { candidates: Candidate[] }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'createdAt', desc: true }]);
  const [globalFilter, setGlobalFilter] = useState('');
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const verdictFilter = (columnFilters.find((f) => f.id === 'latest')?.value as string | undefined) ?? 'all';

  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Name',
        cell: (info) => (
          <Link to={`/candidates/${info.row.original.id}`} className="font-medium text-accent underline underline-offset-2 hover:decoration-2">
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor((c) => FORM_WORD[formOf(c.design)], { id: 'form', header: 'Form' }),
      column.accessor((c) => c.createdBy.name, { id: 'submittedBy', header: 'Submitted by' }),
      column.accessor('createdAt', {
        header: 'Date',
        cell: (info) => <time dateTime={info.getValue()}>{formatDateTime(info.getValue()) ?? info.getValue()}</time>,
      }),
      column.accessor('latest', {
        header: 'Latest verdict per revision',
        cell: (info) => <LatestVerdicts latest={info.getValue()} />,
        sortingFn: (a, b) => STANDING_RANK[standingOf(a.original.latest)] - STANDING_RANK[standingOf(b.original.latest)],
        filterFn: standingFilter,
        enableGlobalFilter: false,
      }),
    ],
    [],
  );

  const table = useReactTable({
    data: candidates,
    columns,
    state: { sorting, globalFilter, columnFilters },
    onSortingChange: setSorting,
    onGlobalFilterChange: setGlobalFilter,
    onColumnFiltersChange: setColumnFilters,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    // Text filter: name, form and submitter, plus the notes that are not a column.
    globalFilterFn: (row, _id, value: string) => {
      const needle = value.trim().toLowerCase();
      if (!needle) return true;
      const c = row.original;
      return [c.name, c.notes, c.createdBy.name, FORM_WORD[formOf(c.design)]].some((s) => s.toLowerCase().includes(needle));
    },
    getRowId: (c) => String(c.id),
  });

  const rows = table.getRowModel().rows;

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-4">
        <TextField
          label="Filter by text"
          type="search"
          placeholder="Name, notes or who submitted it"
          value={globalFilter}
          onChange={(e) => setGlobalFilter(e.target.value)}
          className="min-w-64 flex-1"
        />
        <SelectField
          label="Verdict"
          options={VERDICT_FILTERS}
          value={verdictFilter}
          onChange={(e) => setColumnFilters(e.target.value === 'all' ? [] : [{ id: 'latest', value: e.target.value }])}
        />
      </div>
      <p className="text-sm text-ink-muted" aria-live="polite">
        {rows.length === candidates.length ? `${candidates.length} candidates` : `${rows.length} of ${candidates.length} candidates shown`}
      </p>
      <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">Candidates of this product line. Column headers sort the table.</caption>
          <thead className="border-b border-rule bg-paper-sunk text-xs uppercase tracking-wide text-ink-muted">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none'}
                      className="px-4 py-2 font-medium"
                    >
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="inline-flex items-center gap-1.5 rounded uppercase tracking-wide hover:text-ink"
                      >
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <SortMark direction={sorted} />
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {rows.length === 0 ? (
              <tr>
                <td colSpan={columns.length} className="px-4 py-6 text-center text-ink-muted">
                  No candidate matches these filters.
                </td>
              </tr>
            ) : (
              rows.map((row) => (
                <tr key={row.id} className="border-b border-rule align-top last:border-b-0">
                  {row.getVisibleCells().map((cell) =>
                    cell.column.id === 'name' ? (
                      <th key={cell.id} scope="row" className="px-4 py-2.5 font-normal">
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </th>
                    ) : (
                      <td key={cell.id} className="px-4 py-2.5">
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </td>
                    ),
                  )}
                </tr>
              ))
            )}
          </tbody>
        </table>
      </div>
    </div>
  );
}
