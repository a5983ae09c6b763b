import type { ReactNode } from 'react';

/**
 * The empty state of an area: what will be listed here, what the words mean, who works here
 * and what the reader's own role may do. Written so the page is useful before it has data.
 */
export function AreaIntro({
  emptyTitle,
  emptyText,
  about,
  people,
  yourAccess,
}: {
  emptyTitle: string;
  emptyText: ReactNode;
  about: ReactNode;
  people: { role: string; does: string }[];
  yourAccess: string;
}) {
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <section aria-labelledby="empty-heading" className="self-start rounded border border-dashed border-rule-strong bg-paper-raised px-6 py-8">
        <h2 id="empty-heading" className="text-lg font-semibold">
          {emptyTitle}
        </h2>
        <div className="mt-2 max-w-prose text-ink-muted">{emptyText}</div>
        <p className="mt-4 text-sm">
          <span className="font-medium">Your access: </span>
          {yourAccess}
        </p>
      </section>
      <div className="flex flex-col gap-6">
        <section aria-labelledby="about-heading">
          <h2 id="about-heading" className="text-sm font-semibold uppercase tracking-wide text-ink-muted">
            What lives here
          </h2>
          <div className="mt-2 flex max-w-prose flex-col gap-2 text-sm leading-relaxed">{about}</div>
        </section>
        <section aria-labelledby="people-heading">
          <h2 id="people-heading" className="text-sm font-semibold uppercase tracking-wide text-ink-muted">
            Who works here
          </h2>
          <dl className="mt-2 flex flex-col gap-2 text-sm">
            {people.map((p) => (
              <div key={p.role} className="border-l-2 border-rule-strong pl-3">
                <dt className="font-medium">{p.role}</dt>
                <dd className="text-ink-muted">{p.does}</dd>
              </div>
            ))}
          </dl>
        </section>
      </div>
    </div>
  );
}
