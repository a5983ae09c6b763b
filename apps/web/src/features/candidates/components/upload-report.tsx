import type { UploadReport } from '@polecourt/contracts';
import { Link } from 'react-router-dom';

import { Alert } from '@/components/ui/alert';

/** What happened to each row of an uploaded file: saved (with a link) or refused (with the reason per field). */
export function UploadReportView({ report }: { report: UploadReport }) {
  const { accepted, rejected } = report;
  const rows = [
    ...accepted.map((a) => ({ kind: 'accepted' as const, row: a.row, a })),
    ...rejected.map((r) => ({ kind: 'rejected' as const, row: r.row, r })),
  ].sort((x, y) => x.row - y.row);

  return (
    <section aria-labelledby="upload-report-heading" className="flex flex-col gap-3" data-upload-report="">
      <h2 id="upload-report-heading" className="text-lg font-semibold">
        Upload report
      </h2>
      {accepted.length > 0 ? (
        <Alert tone={rejected.length > 0 ? 'caution' : 'success'} title={`${accepted.length} saved, ${rejected.length} refused`}>
          <p>
            {rejected.length > 0
              ? 'The saved rows are candidates now. Correct the refused rows in the file and upload just those again.'
              : 'Every row is saved as a candidate.'}
          </p>
        </Alert>
      ) : (
        <Alert tone="error" title={`No row saved, ${rejected.length} refused`}>
          <p>Nothing was saved. The reason for each row is below; correct the file and upload it again.</p>
        </Alert>
      )}
      <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">Each row of the uploaded file and what happened to it</caption>
          <thead className="border-b border-rule bg-paper-sunk text-xs uppercase tracking-wide text-ink-muted">
            <tr>
              <th scope="col" className="px-4 py-2 font-medium">
                Row
              </th>
              <th scope="col" className="px-4 py-2 font-medium">
                Name
              </th>
              <th scope="col" className="px-4 py-2 font-medium">
                Outcome
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((item) =>
              item.kind === 'accepted' ? (
                <tr key={`a${item.row}`} className="border-b border-rule align-top last:border-b-0" data-row-outcome="accepted">
                  <td className="px-4 py-2.5 tabular-nums">{item.row}</td>
                  <th scope="row" className="px-4 py-2.5 font-normal">
                    <Link to={`/candidates/${item.a.candidateId}`} className="font-medium text-accent underline underline-offset-2 hover:decoration-2">
                      {item.a.name}
                    </Link>
                  </th>
                  <td className="px-4 py-2.5">
                    <span className="font-semibold text-pass">Saved</span>
                  </td>
                </tr>
              ) : (
                <tr key={`r${item.row}`} className="border-b border-rule bg-fail-soft/40 align-top last:border-b-0" data-row-outcome="rejected">
                  <td className="px-4 py-2.5 tabular-nums">{item.row}</td>
                  <th scope="row" className="px-4 py-2.5 font-normal">
                    {item.r.name || <span className="text-ink-muted">(no name)</span>}
                  </th>
                  <td className="px-4 py-2.5">
                    <span className="font-semibold text-fail">Refused</span>
                    <ul className="mt-1 flex flex-col gap-1">
                      {Object.entries(item.r.errors).map(([field, message]) => (
                        <li key={field}>
                          <code className="rounded bg-paper-sunk px-1 text-xs">{field}</code> {message}
                        </li>
                      ))}
                    </ul>
                  </td>
                </tr>
              ),
            )}
          </tbody>
        </table>
      </div>
    </section>
  );
}
