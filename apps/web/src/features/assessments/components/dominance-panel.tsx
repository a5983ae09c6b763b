import type { Dominance } from '@polecourt/spec';

import { formatComplex, formatNumber, formatQuantity } from '@/lib/format';
import { cx } from '@/utils/cx';

function sentence(note: string): string {
  const text = note.trim();
  if (!text) return text;
  const first = text.charAt(0).toUpperCase() + text.slice(1);
  return /[.!?]$/.test(first) ? first : `${first}.`;
}

/** Whether the second-order view of the dominant pole(s) can be trusted, and why not when it cannot. */
export function DominancePanel({ dominant, dominanceRatio, regionPass }: { dominant: Dominance | null; dominanceRatio: number; regionPass: boolean | null }) {
  if (!dominant) {
    return <p className="text-sm text-ink-muted">No dominant pole could be named for this model, so there is no second-order view of it.</p>;
  }
  const holds = dominant.approximationValid;
  return (
    <div className="flex flex-col gap-3" data-dominance={holds ? 'holds' : 'weak'}>
      <p className={cx('inline-flex w-fit items-center gap-2 rounded border px-2.5 py-1 text-sm font-semibold', holds ? 'border-pass/40 bg-pass-soft text-pass' : 'border-caution/50 bg-caution-soft text-caution')}>
        <span aria-hidden="true">{holds ? '✓' : '!'}</span>
        {holds ? 'Dominance holds' : 'Dominance weak'}
      </p>
      <p className="max-w-prose text-sm">
        {holds
          ? `${
              dominant.ratio === null && dominant.zeroRatio === null
                ? `No other pole or zero competes with the dominant ${dominant.poles.length === 1 ? 'pole' : 'pair'}`
                : `Every other pole and every zero that matters lies at least ${formatNumber(dominanceRatio)} times farther left than the dominant ${dominant.poles.length === 1 ? 'pole' : 'pair'}`
            }, so the second-order estimates are a fair guide. The verdict itself always comes from the exact response.`
          : 'The second-order view of this model cannot be trusted: read the exact values, not the estimates. The verdict comes from the exact response either way.'}
      </p>
      {dominant.notes.length > 0 && (
        <ul className="ml-5 flex max-w-prose list-disc flex-col gap-1 text-sm">
          {dominant.notes.map((note, i) => (
            <li key={i}>{sentence(note)}</li>
          ))}
        </ul>
      )}
      <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm tabular-nums">
        <dt className="font-medium">Dominant {dominant.poles.length === 1 ? 'pole' : 'poles'}</dt>
        <dd>{dominant.poles.map((p) => formatComplex(p)).join(', ')}</dd>
        <dt className="font-medium">Damping ratio</dt>
        <dd>{dominant.dampingRatio === null ? 'none (real pole)' : formatNumber(dominant.dampingRatio)}</dd>
        <dt className="font-medium">Natural frequency</dt>
        <dd>{formatQuantity(dominant.naturalFrequency, 'rad/s')}</dd>
        <dt className="font-medium">Next pole</dt>
        <dd>{dominant.ratio === null ? 'none' : `${formatNumber(dominant.ratio)} times farther left (${formatNumber(dominanceRatio)} needed)`}</dd>
        <dt className="font-medium">Nearest zero</dt>
        <dd>{dominant.zeroRatio === null ? 'none that matters' : `${formatNumber(dominant.zeroRatio)} times farther left (${formatNumber(dominanceRatio)} needed)`}</dd>
        <dt className="font-medium">Admissible region</dt>
        <dd>{regionPass === null ? 'no region to check' : regionPass ? 'the dominant poles lie inside it' : 'the dominant poles lie outside it'}</dd>
      </dl>
    </div>
  );
}
