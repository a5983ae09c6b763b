import type { OutboxMessage } from '@polecourt/contracts';

import { formatDateTime } from '@/utils/format-date-time';

/** One captured message as a reader sees it: headers, then the plain-text body as sent. */
export function OutboxMessageView({ message }: { message: OutboxMessage }) {
  return (
    <article aria-label={`Message: ${message.subject}`} className="flex flex-col gap-3">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-muted">To</dt>
        <dd className="break-all [font-variant-ligatures:no-contextual]">{message.to}</dd>
        <dt className="text-ink-muted">Subject</dt>
        <dd className="font-medium">{message.subject}</dd>
        <dt className="text-ink-muted">Received</dt>
        <dd>
          <time dateTime={message.sentAt}>{formatDateTime(message.sentAt) ?? message.sentAt}</time>
        </dd>
      </dl>
      <pre className="max-h-[60vh] overflow-auto rounded border border-rule bg-paper p-4 font-sans text-sm whitespace-pre-wrap break-words [font-variant-ligatures:no-contextual]">
        {message.text}
      </pre>
    </article>
  );
}
