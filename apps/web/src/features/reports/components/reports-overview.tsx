import type { ReportRecord } from '@polecourt/contracts';
import { useState } from 'react';
import { Link } from 'react-router-dom';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Loading } from '@/components/ui/loading';

import { REPORTS_PAGE_SIZE, useReports } from '../api/get-reports';
import { ReportsTable } from './reports-table';

function byProductLine(reports: readonly ReportRecord[]): { id: number; name: string; items: ReportRecord[] }[] {
  const groups = new Map<number, { id: number; name: string; items: ReportRecord[] }>();
  for (const r of reports) {
    const g = groups.get(r.productLineId) ?? { id: r.productLineId, name: r.productLineName, items: [] };
    g.items.push(r);
    groups.set(r.productLineId, g);
  }
  return [...groups.values()].sort((a, b) => a.name.localeCompare(b.name));
}

/** The signed compliance reports, newest first, in one section per product line. */
export function ReportsOverview({ access, canVerify }: { access: 'read' | 'write'; canVerify: boolean }) {
  const [page, setPage] = useState(1);
  const reports = useReports({ page });
  const pages = reports.data ? Math.max(1, Math.ceil(reports.data.total / REPORTS_PAGE_SIZE)) : 1;
  return (
    <div className="flex flex-col gap-6">
      <p className="max-w-3xl text-sm text-ink-muted">
        {access === 'write'
          ? 'Issue a report from an assessment with “Issue compliance report”. '
          : 'Reports are issued by controls engineers from their assessments. '}
        Each PDF carries an electronic signature with its meaning and a digital signature over the file.
        {canVerify && (
          <>
            {' '}
            Received a copy from elsewhere? <Link to="/reports/verify" className="font-medium text-accent underline">Verify a report</Link>.
          </>
        )}
      </p>
      {reports.isPending && <Loading label="Loading the compliance reports…" />}
      {reports.isError && (
        <Alert tone="error" title="The compliance reports could not be loaded">
          <p>{reports.error.message}</p>
        </Alert>
      )}
      {reports.data && reports.data.total === 0 && <p className="text-sm text-ink-muted">No compliance report has been issued yet.</p>}
      {reports.data &&
        byProductLine(reports.data.items).map((g) => (
          <section key={g.id} aria-labelledby={`line-${g.id}`} className="flex flex-col gap-2">
            <h2 id={`line-${g.id}`} className="text-lg font-semibold">
              {g.name}
            </h2>
            <ReportsTable reports={g.items} />
          </section>
        ))}
      {pages > 1 && (
        <nav aria-label="Report pages" className="flex items-center gap-3 text-sm">
          <Button size="sm" disabled={page <= 1} onClick={() => setPage((p) => p - 1)}>
            Newer
          </Button>
          <span>
            Page {page} of {pages}
          </span>
          <Button size="sm" disabled={page >= pages} onClick={() => setPage((p) => p + 1)}>
            Older
          </Button>
        </nav>
      )}
    </div>
  );
}
