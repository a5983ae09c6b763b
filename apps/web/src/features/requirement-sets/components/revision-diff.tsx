import type { DiffChange, Revision } from '@polecourt/contracts';
import { useId, useState } from 'react';

import { ErrorPanel } from '@/components/errors/error-panel';
import { Loading } from '@/components/ui/loading';
import { cx } from '@/utils/cx';

import { useRevisionDiff } from '../api/get-revision-diff';

import { fieldLabel, limitText } from './limit-text';

const CHANGE_WORD: Record<DiffChange, string> = { added: 'added', removed: 'removed', tightened: 'tightened', loosened: 'loosened', same: 'unchanged' };
const CHANGE_TONE: Record<DiffChange, string> = {
  added: 'text-accent-strong',
  removed: 'text-caution',
  tightened: 'text-ink',
  loosened: 'text-caution',
  same: 'text-ink-faint',
};

/**
 * Two revisions side by side, limit by limit, each marked added / removed / tightened /
 * loosened / unchanged. By default against the revision in force (or, for an approved one,
 * the revision it replaced).
 */
export function RevisionDiff({ revision, revisions }: { revision: Revision; revisions: readonly Revision[] }) {
  const selectId = useId();
  const [against, setAgainst] = useState<number | null>(null);
  const diff = useRevisionDiff({ id: revision.id, against });
  const others = revisions.filter((r) => r.id !== revision.id);
  const againstRevision = diff.data?.againstRevisionId ? revisions.find((r) => r.id === diff.data.againstRevisionId) : null;

  return (
    <section aria-labelledby={`${selectId}-heading`} className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id={`${selectId}-heading`} className="text-lg font-semibold">
          Changes, limit by limit
        </h2>
        {others.length > 0 && (
          <div className="flex items-center gap-2 text-sm">
            <label htmlFor={selectId}>Compare with</label>
            <select
              id={selectId}
              value={against ?? ''}
              onChange={(e) => setAgainst(e.target.value === '' ? null : Number(e.target.value))}
              className="rounded border border-rule-strong bg-paper-raised px-2 py-1"
            >
              <option value="">The revision in force (or the one it replaced)</option>
              {others.map((r) => (
                <option key={r.id} value={r.id}>
                  Revision {r.number} ({r.status.replace('_', ' ')})
                </option>
              ))}
            </select>
          </div>
        )}
      </div>
      {diff.isPending ? (
        <Loading label="Comparing revisions…" />
      ) : diff.isError ? (
        <ErrorPanel error={diff.error} title="The comparison could not be loaded" onRetry={() => void diff.refetch()} />
      ) : (
        <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
          <table className="w-full text-left text-sm tabular-nums">
            <caption className="sr-only">
              Revision {revision.number} compared with {againstRevision ? `revision ${againstRevision.number}` : 'no earlier revision'}
            </caption>
            <thead className="border-b border-rule bg-paper-sunk text-xs uppercase tracking-wide text-ink-muted">
              <tr>
                <th scope="col" className="px-4 py-2 font-medium">
                  Limit
                </th>
                <th scope="col" className="px-4 py-2 font-medium">
                  {againstRevision ? `Revision ${againstRevision.number}` : 'No earlier revision'}
                </th>
                <th scope="col" className="px-4 py-2 font-medium">
                  Revision {revision.number}
                </th>
                <th scope="col" className="px-4 py-2 font-medium">
                  Change
                </th>
              </tr>
            </thead>
            <tbody>
              {diff.data.items.map((row) => (
                <tr key={row.field} className="border-b border-rule last:border-b-0">
                  <th scope="row" className="px-4 py-2 font-medium">
                    {fieldLabel(row.field)}
                  </th>
                  <td className="px-4 py-2">{row.before === null ? <span className="text-ink-faint">none</span> : limitText(row.field, row.before)}</td>
                  <td className="px-4 py-2">{row.after === null ? <span className="text-ink-faint">none</span> : limitText(row.field, row.after)}</td>
                  <td className={cx('px-4 py-2 font-medium', CHANGE_TONE[row.change])}>{CHANGE_WORD[row.change]}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
