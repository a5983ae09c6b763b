import type { ReportRecord } from '@polecourt/contracts';

import { reportPdfUrl } from '../api/get-report';
import { meaningWord, shortHash, utc } from './report-words';
import { VerdictBadge } from './verdict-badge';

/** Reports as rows: number, what was assessed, verdict, signature, and the signed PDF to download. */
export function ReportsTable({ reports, showCandidate = true }: { reports: readonly ReportRecord[]; showCandidate?: boolean }) {
  return (
    <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
      <table className="w-full text-left text-sm">
        <thead className="bg-paper-sunk text-xs text-ink-muted">
          <tr>
            <th scope="col" className="px-3 py-2 font-semibold">Report</th>
            {showCandidate && <th scope="col" className="px-3 py-2 font-semibold">Candidate</th>}
            <th scope="col" className="px-3 py-2 font-semibold">Revision</th>
            <th scope="col" className="px-3 py-2 font-semibold">Verdict</th>
            <th scope="col" className="px-3 py-2 font-semibold">Signed</th>
            <th scope="col" className="px-3 py-2 font-semibold">
              <span className="sr-only">Download</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {reports.map((r) => (
            <tr key={r.id} className="border-t border-rule align-top">
              <td className="px-3 py-2">
                <div className="font-medium tabular-nums">{r.number}</div>
                <div className="text-xs text-ink-faint" title={r.sha256}>
                  SHA-256 {shortHash(r.sha256)}
                </div>
              </td>
              {showCandidate && <td className="px-3 py-2">{r.candidateName}</td>}
              <td className="px-3 py-2">
                {r.requirementSetName}, revision {r.revisionNumber}
              </td>
              <td className="px-3 py-2">
                <VerdictBadge verdict={r.verdict} />
              </td>
              <td className="px-3 py-2">
                <div>
                  {meaningWord(r.meaning)} by {r.signer.name}
                </div>
                <div className="text-xs text-ink-muted">{utc(r.signedAt)}</div>
              </td>
              <td className="px-3 py-2 text-right">
                <a className="font-medium text-accent underline-offset-2 hover:underline" href={reportPdfUrl(r.id)} download={`${r.number}.pdf`}>
                  Download PDF<span className="sr-only"> of {r.number}</span>
                </a>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
