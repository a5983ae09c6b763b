import type { AuditEvent } from '@polecourt/contracts';

import { cx } from '@/utils/cx';

import { type FieldChange, auditDiff, showValue } from './audit-diff';
import { utcTime } from './event-words';

const CHANGE_WORDS: Record<FieldChange, string> = {
  changed: 'Changed',
  added: 'Added',
  removed: 'Removed',
  unchanged: 'Same',
};

function Value({ value, struck }: { value: unknown; struck?: boolean }) {
  const text = showValue(value);
  const quiet = value === null || value === undefined || value === '';
  return (
    <span className={cx('break-all whitespace-pre-wrap font-mono text-xs', quiet && 'text-ink-muted italic', struck && 'line-through decoration-fail/70')}>{text}</span>
  );
}

/**
 * One event opened up: who, when and the record field by field. Every row
 * says in a word how the field changed (the colour only repeats it).
 */
export function EventDiff({ event, productLineName }: { event: AuditEvent; productLineName: string | null }) {
  const rows = auditDiff(event.before, event.after);
  const changed = rows.filter((r) => r.change !== 'unchanged');
  const unchanged = rows.filter((r) => r.change === 'unchanged');
  const summary =
    event.before === null && event.after === null
      ? 'This event records an action, with no record before or after it.'
      : event.before === null
        ? 'A new record: every field below was set by this event.'
        : changed.length === 0
          ? 'No field of the record changed.'
          : `${changed.length} field${changed.length === 1 ? '' : 's'} changed, ${unchanged.length} stayed the same.`;

  return (
    <div className="flex flex-col gap-3">
      <dl className="grid grid-cols-[max-content_1fr] gap-x-6 gap-y-1 text-sm">
        <dt className="text-ink-muted">Event</dt>
        <dd className="tabular-nums">{event.id}</dd>
        <dt className="text-ink-muted">Recorded</dt>
        <dd>
          <time dateTime={event.occurredAt}>{utcTime(event.occurredAt)}</time>
        </dd>
        <dt className="text-ink-muted">By</dt>
        <dd>{event.actorEmail ?? 'Polecourt itself (no signed-in person)'}</dd>
        {event.productLineId !== null && (
          <>
            <dt className="text-ink-muted">Product line</dt>
            <dd>{productLineName ?? `Product line ${event.productLineId}`}</dd>
          </>
        )}
        <dt className="text-ink-muted">Hash</dt>
        <dd className="break-all font-mono text-xs">{event.hash}</dd>
        <dt className="text-ink-muted">Previous hash</dt>
        <dd className="break-all font-mono text-xs">{event.prevHash}</dd>
      </dl>
      <p className="text-sm">{summary}</p>
      {changed.length > 0 && <DiffTable caption={`Fields this event set or changed (event ${event.id})`} rows={changed} />}
      {unchanged.length > 0 && (
        <details className="text-sm">
          <summary className="cursor-pointer font-medium text-accent">
            Show the {unchanged.length} field{unchanged.length === 1 ? '' : 's'} that stayed the same
          </summary>
          <div className="mt-2">
            <DiffTable caption={`Fields that stayed the same (event ${event.id})`} rows={unchanged} />
          </div>
        </details>
      )}
    </div>
  );
}

function DiffTable({ caption, rows }: { caption: string; rows: ReturnType<typeof auditDiff> }) {
  return (
    <div className="overflow-x-auto rounded border border-rule bg-paper">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b border-rule bg-paper-sunk text-xs uppercase tracking-wide text-ink-muted">
          <tr>
            <th scope="col" className="px-3 py-1.5 font-medium">
              Field
            </th>
            <th scope="col" className="px-3 py-1.5 font-medium">
              Change
            </th>
            <th scope="col" className="px-3 py-1.5 font-medium">
              Before
            </th>
            <th scope="col" className="px-3 py-1.5 font-medium">
              After
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.path} className="border-b border-rule align-top last:border-b-0">
              <th scope="row" className="px-3 py-1.5 font-mono text-xs font-medium">
                {r.path}
              </th>
              <td className="px-3 py-1.5">
                <span
                  className={cx(
                    'inline-block rounded border px-1.5 text-xs font-semibold',
                    r.change === 'changed' && 'border-caution/50 bg-caution-soft text-ink',
                    r.change === 'added' && 'border-pass/50 bg-pass-soft text-ink',
                    r.change === 'removed' && 'border-fail/50 bg-fail-soft text-ink',
                    r.change === 'unchanged' && 'border-rule text-ink-muted',
                  )}
                >
                  {CHANGE_WORDS[r.change]}
                </span>
              </td>
              <td className="px-3 py-1.5">{r.change === 'added' ? <span className="text-xs text-ink-muted">(not present)</span> : <Value value={r.before} struck={r.change === 'changed' || r.change === 'removed'} />}</td>
              <td className="px-3 py-1.5">{r.change === 'removed' ? <span className="text-xs text-ink-muted">(not present)</span> : <Value value={r.after} />}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
