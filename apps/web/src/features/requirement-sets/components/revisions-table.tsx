import type { RequirementSet } from '@polecourt/contracts';
import { Link } from 'react-router-dom';

import { Sha256Digest } from '@/components/sha256-digest';
import { cx } from '@/utils/cx';
import { formatUtc } from '@/utils/format-utc';

import { RevisionStatusBadge } from './revision-status-badge';

/** Every revision of a set, newest first; the one in force stands out. */
export function RevisionsTable({ set }: { set: RequirementSet }) {
  const revisions = [...set.revisions].sort((a, b) => b.number - a.number);
  if (revisions.length === 0) {
    return <p className="rounded border border-dashed border-rule-strong bg-paper-raised px-4 py-6 text-sm text-ink-muted">No revisions yet.</p>;
  }
  return (
    <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
      <table className="w-full border-collapse text-left text-sm tabular-nums">
        <caption className="sr-only">Revisions of {set.name}</caption>
        <thead className="border-b border-rule bg-paper-sunk text-xs uppercase tracking-wide text-ink-muted">
          <tr>
            <th scope="col" className="px-4 py-2 font-medium">
              Revision
            </th>
            <th scope="col" className="px-4 py-2 font-medium">
              Status
            </th>
            <th scope="col" className="px-4 py-2 font-medium">
              Author
            </th>
            <th scope="col" className="px-4 py-2 font-medium">
              Approver
            </th>
            <th scope="col" className="px-4 py-2 font-medium">
              Approved (UTC)
            </th>
            <th scope="col" className="px-4 py-2 font-medium">
              Fingerprint
            </th>
          </tr>
        </thead>
        <tbody>
          {revisions.map((r) => {
            const inForce = r.id === set.currentRevisionId;
            return (
              <tr key={r.id} className={cx('border-b border-rule last:border-b-0', inForce && 'bg-accent-soft/60 shadow-[inset_3px_0_0_var(--color-accent)]')}>
                <th scope="row" className="px-4 py-2.5 font-medium">
                  <Link to={`/revisions/${r.id}`} className="text-accent underline-offset-2 hover:underline">
                    Revision {r.number}
                  </Link>
                  {inForce && <span className="ml-2 text-xs font-semibold uppercase tracking-wide text-accent-strong">In force</span>}
                </th>
                <td className="px-4 py-2.5">
                  <RevisionStatusBadge status={r.status} />
                </td>
                <td className="px-4 py-2.5">{r.author.name}</td>
                <td className="px-4 py-2.5">{r.approver?.name ?? <span className="text-ink-faint">—</span>}</td>
                <td className="px-4 py-2.5">{r.approvedAt ? <time dateTime={r.approvedAt}>{formatUtc(r.approvedAt)}</time> : <span className="text-ink-faint">—</span>}</td>
                <td className="px-4 py-2.5">{r.sha256 ? <Sha256Digest value={r.sha256} /> : <span className="text-ink-faint">set at approval</span>}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
