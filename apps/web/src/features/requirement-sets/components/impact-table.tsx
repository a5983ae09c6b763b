import type { ImpactRow, RevisionImpact } from '@polecourt/contracts';
import type { Check } from '@polecourt/spec';

import { formatSignedPercent } from '@/lib/format';
import { cx } from '@/utils/cx';

import { fieldLabel, limitText } from './limit-text';

type Outcome = ImpactRow['proposed'];

function verdictOf(o: Outcome | null): string {
  if (o === null) return 'no revision in force';
  if ('error' in o) return 'cannot be assessed';
  return o.verdict === 'compliant' ? 'compliant' : 'not compliant';
}

function Verdict({ outcome }: { outcome: Outcome | null }) {
  const word = verdictOf(outcome);
  const tone = outcome && !('error' in outcome) ? (outcome.verdict === 'compliant' ? 'bg-pass-soft text-pass' : 'bg-fail-soft text-fail') : 'bg-paper-sunk text-ink-muted';
  return <span className={cx('inline-block rounded px-2 py-0.5 text-xs font-semibold whitespace-nowrap', tone)}>{word}</span>;
}

function checksOf(o: Outcome | null): Check[] {
  return o && !('error' in o) ? (o.checks as Check[]) : [];
}

const STATUS_WORD: Record<Check['status'], string> = { pass: 'pass', fail: 'fail', 'n/a': 'n/a' };

function CheckCell({ check }: { check: Check | undefined }) {
  if (!check) return <td className="px-2 py-1 text-ink-faint">—</td>;
  return (
    <td className="px-2 py-1 tabular-nums">
      <span className={check.status === 'pass' ? 'font-medium text-pass' : check.status === 'fail' ? 'font-medium text-fail' : 'text-ink-muted'}>
        {STATUS_WORD[check.status]}
      </span>{' '}
      {limitText(check.requirement, check.value)} vs {limitText(check.requirement, check.effectiveLimit ?? check.limit)}
      {check.marginPct !== null && <span className="text-ink-muted"> (margin {formatSignedPercent(check.marginPct, 3)})</span>}
    </td>
  );
}

/** One candidate's checks, limit by limit, against the revision in force and against this one. */
function LimitRows({ row }: { row: ImpactRow }) {
  const current = checksOf(row.current);
  const proposed = checksOf(row.proposed);
  const keys = [...new Set([...current.map((c) => c.requirement), ...proposed.map((c) => c.requirement)])];
  const error = 'error' in row.proposed ? row.proposed.error : row.current && 'error' in row.current ? row.current.error : null;
  if (keys.length === 0) return error ? <p className="px-2 py-1 text-sm text-ink-muted">{error}</p> : null;
  return (
    <table className="w-full text-left text-xs">
      <caption className="sr-only">Checks of {row.name}, limit by limit</caption>
      <thead className="text-ink-muted">
        <tr>
          <th scope="col" className="px-2 py-1 font-medium">
            Limit
          </th>
          <th scope="col" className="px-2 py-1 font-medium">
            Against the revision in force
          </th>
          <th scope="col" className="px-2 py-1 font-medium">
            Against this revision
          </th>
        </tr>
      </thead>
      <tbody>
        {keys.map((k) => {
          const a = current.find((c) => c.requirement === k);
          const b = proposed.find((c) => c.requirement === k);
          const flips = a && b && a.status !== b.status;
          return (
            <tr key={k} className={cx('border-t border-rule', flips && 'bg-caution-soft')}>
              <th scope="row" className="px-2 py-1 font-medium">
                {fieldLabel(k)}
                {flips && <span className="sr-only"> (status changes)</span>}
              </th>
              <CheckCell check={a} />
              <CheckCell check={b} />
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

/** The revision impact: every candidate of the product line, verdict in force vs proposed, changes first. */
export function ImpactTable({ impact }: { impact: RevisionImpact }) {
  if (impact.total === 0) {
    return <p className="text-sm text-ink-muted">The product line has no candidates yet, so approving this revision changes no verdict.</p>;
  }
  return (
    <div className="flex flex-col gap-2">
      <p className="text-sm">
        <span className="font-semibold">
          {impact.changedCount} of {impact.total} {impact.total === 1 ? 'candidate changes' : 'candidates change'} verdict
        </span>
        {impact.baselineRevisionId === null ? ' (there is no revision in force yet, so every candidate gets its first verdict).' : '.'}
      </p>
      <ul className="flex max-h-[45vh] flex-col gap-2 overflow-y-auto rounded border border-rule bg-paper p-2" aria-label="Candidates and their verdicts">
        {impact.items.map((row) => (
          <li key={row.candidateId} className={cx('rounded border bg-paper-raised', row.changed ? 'border-caution/60' : 'border-rule')}>
            <details open={row.changed}>
              <summary className="flex cursor-pointer flex-wrap items-center gap-2 px-3 py-2 text-sm">
                <span className="font-medium">{row.name}</span>
                <span className="flex items-center gap-1">
                  <Verdict outcome={row.current} />
                  <span aria-hidden="true">→</span>
                  <span className="sr-only">becomes</span>
                  <Verdict outcome={row.proposed} />
                </span>
                <span className={cx('text-xs', row.changed ? 'font-semibold text-caution' : 'text-ink-muted')}>{row.changed ? 'verdict changes' : 'no change'}</span>
              </summary>
              <div className="border-t border-rule px-1 pb-2">
                <LimitRows row={row} />
              </div>
            </details>
          </li>
        ))}
      </ul>
    </div>
  );
}
