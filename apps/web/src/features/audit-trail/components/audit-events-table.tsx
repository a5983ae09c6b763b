import type { AuditEvent } from '@polecourt/contracts';
import { Fragment, useState } from 'react';

import { Button } from '@/components/ui/button';
import { cx } from '@/utils/cx';

import { EventDiff } from './event-diff';
import { entityLabel, utcTime } from './event-words';

/**
 * One page of events, newest first. Each row opens in place (a button with
 * aria-expanded) to show its record before and after, field by field.
 */
export function AuditEventsTable({ events, lineName }: { events: readonly AuditEvent[]; lineName: (id: number | null) => string | null }) {
  const [open, setOpen] = useState<ReadonlySet<number>>(new Set());
  const toggle = (id: number) =>
    setOpen((prev) => {
      const next = new Set(prev);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });

  return (
    <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
      <table className="w-full border-collapse text-left text-sm tabular-nums">
        <caption className="sr-only">Audit events, newest first. Open an event to see its record before and after.</caption>
        <thead className="border-b border-rule bg-paper-sunk text-xs uppercase tracking-wide text-ink-muted">
          <tr>
            <th scope="col" className="px-4 py-2 font-medium">
              Event
            </th>
            <th scope="col" className="px-4 py-2 font-medium">
              Time (UTC)
            </th>
            <th scope="col" className="px-4 py-2 font-medium">
              Person
            </th>
            <th scope="col" className="px-4 py-2 font-medium">
              Action
            </th>
            <th scope="col" className="px-4 py-2 font-medium">
              Record
            </th>
            <th scope="col" className="px-4 py-2 font-medium">
              Product line
            </th>
            <th scope="col" className="px-4 py-2 font-medium">
              <span className="sr-only">Details</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {events.map((e) => {
            const expanded = open.has(e.id);
            const panelId = `audit-event-${e.id}-details`;
            const line = e.productLineId === null ? null : (lineName(e.productLineId) ?? `Product line ${e.productLineId}`);
            return (
              <Fragment key={e.id}>
                <tr className={cx('border-b border-rule align-top', expanded && 'bg-accent-soft')}>
                  <th scope="row" className="px-4 py-2.5 font-medium">
                    {e.id}
                  </th>
                  <td className="px-4 py-2.5 whitespace-nowrap">
                    <time dateTime={e.occurredAt}>{utcTime(e.occurredAt)}</time>
                  </td>
                  <td className="px-4 py-2.5 whitespace-nowrap">{e.actorEmail ?? <span className="text-ink-muted">Polecourt itself</span>}</td>
                  <td className="px-4 py-2.5 font-mono text-xs whitespace-nowrap">{e.action}</td>
                  <td className="px-4 py-2.5">{entityLabel(e)}</td>
                  <td className="px-4 py-2.5">{line ?? <span className="text-ink-muted">None</span>}</td>
                  <td className="px-4 py-2.5 text-right">
                    <Button size="sm" aria-expanded={expanded} aria-controls={panelId} onClick={() => toggle(e.id)}>
                      {expanded ? 'Hide changes' : 'Show changes'}
                      <span className="sr-only"> of event {e.id}</span>
                    </Button>
                  </td>
                </tr>
                {expanded && (
                  <tr className="border-b border-rule bg-paper">
                    <td id={panelId} colSpan={7} className="px-4 py-4">
                      <EventDiff event={e} productLineName={line} />
                    </td>
                  </tr>
                )}
              </Fragment>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
