import type { OutboxMessage } from '@polecourt/contracts';
import { useState } from 'react';

import { ErrorPanel } from '@/components/errors/error-panel';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Loading } from '@/components/ui/loading';
import { cx } from '@/utils/cx';
import { formatDateTime } from '@/utils/format-date-time';

import { OUTBOX_PAGE_SIZE, useOutbox } from '../api/get-outbox';

import { OutboxMessageView } from './outbox-message';

/** The messages the local mail fake received, newest first; each opens to show its text. */
export function OutboxList({ page, onPageChange }: { page: number; onPageChange: (page: number) => void }) {
  const outbox = useOutbox({ page });
  const [open, setOpen] = useState<OutboxMessage | null>(null);

  const total = outbox.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / OUTBOX_PAGE_SIZE));
  const first = total === 0 ? 0 : (page - 1) * OUTBOX_PAGE_SIZE + 1;
  const last = Math.min(total, page * OUTBOX_PAGE_SIZE);

  return (
    <section aria-labelledby="outbox-heading" className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="outbox-heading" className="text-lg font-semibold">
          Messages
        </h2>
        <Button size="sm" busy={outbox.isFetching} onClick={() => void outbox.refetch()}>
          {outbox.isFetching ? 'Checking…' : 'Check for new messages'}
        </Button>
      </div>

      {outbox.isPending ? (
        <Loading label="Loading messages…" />
      ) : outbox.isError ? (
        <ErrorPanel error={outbox.error} title="The outbox could not be loaded" onRetry={() => void outbox.refetch()} />
      ) : outbox.data.items.length === 0 ? (
        <Alert tone="info" title={page > 1 ? 'No messages on this page' : 'No messages yet'}>
          {page > 1 ? <p>Go back to the first page.</p> : <p>Invitations, password resets and workflow notices appear here once they are sent.</p>}
        </Alert>
      ) : (
        <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
          <table className="w-full border-collapse text-left text-sm tabular-nums">
            <caption className="sr-only">Messages received by the local mail fake, newest first</caption>
            <thead className="border-b border-rule bg-paper-sunk text-xs uppercase tracking-wide text-ink-muted">
              <tr>
                <th scope="col" className="px-4 py-2 font-medium">
                  Received
                </th>
                <th scope="col" className="px-4 py-2 font-medium">
                  To
                </th>
                <th scope="col" className="px-4 py-2 font-medium">
                  Subject
                </th>
                <th scope="col" className="px-4 py-2 font-medium">
                  <span className="sr-only">Open</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {outbox.data.items.map((message) => (
                <tr key={message.id} className={cx('border-b border-rule last:border-b-0', open?.id === message.id && 'bg-accent-soft')}>
                  <td className="px-4 py-2.5 whitespace-nowrap">
                    <time dateTime={message.sentAt}>{formatDateTime(message.sentAt) ?? message.sentAt}</time>
                  </td>
                  <td className="px-4 py-2.5 break-all [font-variant-ligatures:no-contextual]">{message.to}</td>
                  <th scope="row" className="px-4 py-2.5 font-medium">
                    {message.subject || <span className="text-ink-muted">(no subject)</span>}
                  </th>
                  <td className="px-4 py-2.5 text-right">
                    <Button size="sm" aria-label={`Read “${message.subject}” to ${message.to}`} onClick={() => setOpen(message)}>
                      Read
                    </Button>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}

      {total > OUTBOX_PAGE_SIZE && (
        <nav aria-label="Pages of messages" className="flex items-center justify-between gap-3 text-sm">
          <p className="text-ink-muted" aria-live="polite">
            {first}–{last} of {total}
          </p>
          <div className="flex gap-2">
            <Button size="sm" disabled={page <= 1} onClick={() => onPageChange(page - 1)}>
              Previous page
            </Button>
            <Button size="sm" disabled={page >= pages} onClick={() => onPageChange(page + 1)}>
              Next page
            </Button>
          </div>
        </nav>
      )}

      <Dialog open={open !== null} onClose={() => setOpen(null)} title={open?.subject || 'Message'}>
        {open && (
          <div className="flex flex-col gap-4">
            <OutboxMessageView message={open} />
            <div className="flex justify-end">
              <Button onClick={() => setOpen(null)}>Close</Button>
            </div>
          </div>
        )}
      </Dialog>
    </section>
  );
}
