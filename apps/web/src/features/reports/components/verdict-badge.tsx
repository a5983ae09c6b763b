import type { ReportRecord } from '@polecourt/contracts';

import { cx } from '@/utils/cx';

import { verdictWord } from './report-words';

export function VerdictBadge({ verdict }: { verdict: ReportRecord['verdict'] }) {
  return (
    <span
      className={cx(
        'inline-block rounded px-2 py-0.5 text-xs font-semibold',
        verdict === 'compliant' ? 'bg-pass-soft text-pass' : 'bg-fail-soft text-fail',
      )}
    >
      {verdictWord(verdict)}
    </span>
  );
}
