import type { Check } from '@polecourt/spec';

import { formatNumber, formatQuantity, formatSignedPercent } from '@/lib/format';
import { cx } from '@/utils/cx';

import { requirementWord } from './requirement-words';

const STATUS: Record<Check['status'], { word: string; className: string }> = {
  pass: { word: 'Pass', className: 'text-pass' },
  fail: { word: 'Fail', className: 'text-fail' },
  'n/a': { word: 'Not applicable', className: 'text-ink-muted' },
};

function limitText(check: Check): string {
  const w = requirementWord(check.requirement);
  return `${w.sense === 'max' ? '≤' : '≥'} ${formatQuantity(check.limit, w.unit)}`;
}

/** One row per limit: the limit, the exact value, the second-order estimate, the status word and the margin. */
export function ChecksTable({ checks, marginPct }: { checks: readonly Check[]; marginPct: number | null }) {
  if (checks.length === 0) return <p className="text-sm text-ink-muted">This revision sets no limit that gives a check.</p>;
  return (
    <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
      <table className="w-full border-collapse text-left text-sm tabular-nums" data-checks-table="">
        <caption className="sr-only">Checks of this assessment, one per limit of the revision</caption>
        <thead className="border-b border-rule bg-paper-sunk text-xs uppercase tracking-wide text-ink-muted">
          <tr>
            <th scope="col" className="px-4 py-2 font-medium">Requirement</th>
            <th scope="col" className="px-4 py-2 font-medium">Limit</th>
            <th scope="col" className="px-4 py-2 font-medium">Exact value</th>
            <th scope="col" className="px-4 py-2 font-medium">Second-order estimate</th>
            <th scope="col" className="px-4 py-2 font-medium">Status</th>
            <th scope="col" className="px-4 py-2 font-medium">
              Margin <span className="sr-only">(how far inside the limit, in percent of the limit)</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {checks.map((check) => {
            const w = requirementWord(check.requirement);
            const status = STATUS[check.status];
            const tightened = check.effectiveLimit !== undefined && check.effectiveLimit !== check.limit;
            return (
              <tr key={check.requirement} className="border-b border-rule align-top last:border-b-0" data-check={check.requirement}>
                <th scope="row" className="px-4 py-2.5 font-medium">
                  {w.name}
                </th>
                <td className="px-4 py-2.5 whitespace-nowrap">
                  {limitText(check)}
                  {tightened && (
                    <span className="block text-xs text-ink-muted">
                      {formatQuantity(check.effectiveLimit, w.unit)} with the {formatNumber(marginPct)} % margin
                    </span>
                  )}
                </td>
                <td className="px-4 py-2.5 whitespace-nowrap">{check.value === null ? <span className="text-ink-muted">none</span> : formatQuantity(check.value, w.unit)}</td>
                <td className="px-4 py-2.5 whitespace-nowrap">{check.estimate === null ? <span className="text-ink-muted">none</span> : formatQuantity(check.estimate, w.unit)}</td>
                <td className="px-4 py-2.5">
                  <span className={cx('font-semibold', status.className)} data-status={check.status}>
                    {status.word}
                  </span>
                  {check.reason && <span className="mt-0.5 block max-w-xs text-xs text-ink-muted">{check.reason}</span>}
                </td>
                <td className="px-4 py-2.5 whitespace-nowrap">{formatSignedPercent(check.marginPct)}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
