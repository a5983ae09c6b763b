import { cx } from '@/utils/cx';

export type Verdict = 'compliant' | 'noncompliant';

/** The verdict as Polecourt says it: always a word, the colour only beside it. */
export function verdictWord(verdict: Verdict): string {
  return verdict === 'compliant' ? 'Compliant' : 'Not compliant';
}

export function VerdictBadge({ verdict, size = 'sm' }: { verdict: Verdict; size?: 'sm' | 'lg' }) {
  return (
    <span
      data-verdict={verdict}
      className={cx(
        'inline-flex items-center gap-1.5 rounded border font-semibold whitespace-nowrap',
        size === 'lg' ? 'px-3 py-1 text-base' : 'px-2 py-0.5 text-xs',
        verdict === 'compliant' ? 'border-pass/40 bg-pass-soft text-pass' : 'border-fail/40 bg-fail-soft text-fail',
      )}
    >
      <span aria-hidden="true">{verdict === 'compliant' ? '✓' : '✗'}</span>
      {verdictWord(verdict)}
    </span>
  );
}
