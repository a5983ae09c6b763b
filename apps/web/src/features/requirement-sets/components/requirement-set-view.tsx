import type { RequirementSet } from '@polecourt/contracts';
import { Link } from 'react-router-dom';

import { LimitsTable } from './limits-table';
import { RevisionsTable } from './revisions-table';

/** The body of a requirement set's page: the revision in force at a glance, then every revision. */
export function RequirementSetView({ set, canEdit }: { set: RequirementSet; canEdit: boolean }) {
  const inForce = set.revisions.find((r) => r.id === set.currentRevisionId) ?? null;
  return (
    <div className="flex flex-col gap-6">
      <section aria-labelledby="in-force-heading" className="rounded border border-rule bg-paper-raised px-5 py-4">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h2 id="in-force-heading" className="font-semibold">
            {inForce ? `In force: revision ${inForce.number}` : 'No revision in force yet'}
          </h2>
          {canEdit && (
            <Link
              to={`/requirement-sets/${set.id}/revisions/new`}
              className="inline-flex items-center rounded border border-accent bg-accent px-4 py-2 text-sm font-medium text-paper-raised hover:bg-accent-strong"
            >
              New revision
            </Link>
          )}
        </div>
        {inForce ? (
          <div className="mt-2 max-w-xl">
            <LimitsTable requirements={inForce.requirements} />
            <p className="mt-2 text-sm">
              <Link to={`/revisions/${inForce.id}`} className="text-accent underline underline-offset-2">
                Open revision {inForce.number}
              </Link>{' '}
              for its region, rationale and signature.
            </p>
          </div>
        ) : (
          <p className="mt-1 text-sm text-ink-muted">
            Candidates of this product line cannot be assessed against this set until a revision is approved.
            {canEdit ? ' “New revision” starts a draft.' : ''}
          </p>
        )}
        {canEdit && inForce && <p className="mt-2 text-xs text-ink-muted">A new revision starts from the limits in force.</p>}
      </section>
      <section aria-labelledby="revisions-heading" className="flex flex-col gap-3">
        <h2 id="revisions-heading" className="text-lg font-semibold">
          Revisions
        </h2>
        <RevisionsTable set={set} />
      </section>
    </div>
  );
}
