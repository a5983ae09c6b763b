import type { RequirementSet, RequirementSetSummary } from '@polecourt/contracts';
import { useQueries } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';

import { ErrorPanel } from '@/components/errors/error-panel';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Loading } from '@/components/ui/loading';

import { getRequirementSetQueryOptions } from '../api/get-requirement-set';
import { useRequirementSets } from '../api/get-requirement-sets';

import { CreateRequirementSetForm } from './create-requirement-set-form';
import { RevisionStatusBadge } from './revision-status-badge';

/** A product line's requirement sets, each with its revision in force and any revision in review. */
export function RequirementSetsList({ productLineId, canEdit }: { productLineId: number; canEdit: boolean }) {
  const sets = useRequirementSets({ productLineId });
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  // The summaries do not say what is in review; each set's detail does (a line has a handful of sets).
  const details = useQueries({ queries: (sets.data?.items ?? []).map((s) => getRequirementSetQueryOptions(s.id)) });

  return (
    <section aria-labelledby="sets-heading" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="sets-heading" className="text-lg font-semibold">
          Requirement sets
        </h2>
        {canEdit && (
          <Button variant="primary" onClick={() => setCreating(true)}>
            New requirement set
          </Button>
        )}
      </div>
      {sets.isPending ? (
        <Loading label="Loading requirement sets…" />
      ) : sets.isError ? (
        <ErrorPanel error={sets.error} title="The requirement sets could not be loaded" onRetry={() => void sets.refetch()} />
      ) : sets.data.items.length === 0 ? (
        <p className="rounded border border-dashed border-rule-strong bg-paper-raised px-4 py-6 text-sm text-ink-muted">
          No requirement sets yet.{canEdit ? ' Create one with “New requirement set”, then write its first revision.' : ''}
        </p>
      ) : (
        <ul className="flex flex-col gap-3">
          {sets.data.items.map((s, i) => (
            <SetCard key={s.id} summary={s} detail={details[i]?.data} />
          ))}
        </ul>
      )}
      {canEdit && (
        <Dialog open={creating} onClose={() => setCreating(false)} title="New requirement set" description="A named list of transient limits; its revisions carry the numbers.">
          <CreateRequirementSetForm
            productLineId={productLineId}
            onCancel={() => setCreating(false)}
            onCreated={(set) => {
              setCreating(false);
              void navigate(`/requirement-sets/${set.id}`);
            }}
          />
        </Dialog>
      )}
    </section>
  );
}

function SetCard({ summary, detail }: { summary: RequirementSetSummary; detail: RequirementSet | undefined }) {
  const inReview = detail?.revisions.filter((r) => r.status === 'in_review') ?? [];
  const drafts = detail?.revisions.filter((r) => r.status === 'draft') ?? [];
  return (
    <li className="rounded border border-rule bg-paper-raised px-5 py-4">
      <h3 className="font-semibold">
        <Link to={`/requirement-sets/${summary.id}`} className="text-accent underline-offset-2 hover:underline">
          {summary.name}
        </Link>
      </h3>
      {summary.purpose && <p className="mt-1 text-sm text-ink-muted">{summary.purpose}</p>}
      <dl className="mt-3 flex flex-wrap gap-x-8 gap-y-2 text-sm">
        <div>
          <dt className="text-xs uppercase tracking-wide text-ink-muted">In force</dt>
          <dd className="mt-0.5">
            {summary.currentRevisionId !== null ? (
              <Link to={`/revisions/${summary.currentRevisionId}`} className="inline-flex items-center gap-2 text-accent underline-offset-2 hover:underline">
                Revision {summary.currentRevisionNumber} <RevisionStatusBadge status="approved" />
              </Link>
            ) : (
              <span className="text-ink-muted">None approved yet</span>
            )}
          </dd>
        </div>
        <div>
          <dt className="text-xs uppercase tracking-wide text-ink-muted">In review</dt>
          <dd className="mt-0.5 flex flex-wrap gap-2">
            {!detail ? (
              <span className="text-ink-muted">…</span>
            ) : inReview.length === 0 ? (
              <span className="text-ink-muted">None</span>
            ) : (
              inReview.map((r) => (
                <Link key={r.id} to={`/revisions/${r.id}`} className="inline-flex items-center gap-2 text-accent underline-offset-2 hover:underline">
                  Revision {r.number} <RevisionStatusBadge status="in_review" />
                </Link>
              ))
            )}
          </dd>
        </div>
        <div>
          <dt className="text-xs uppercase tracking-wide text-ink-muted">Revisions</dt>
          <dd className="mt-0.5">
            {summary.revisionCount}
            {drafts.length > 0 && <span className="text-ink-muted"> ({drafts.length === 1 ? 'one draft' : `${drafts.length} drafts`})</span>}
          </dd>
        </div>
      </dl>
    </li>
  );
}
