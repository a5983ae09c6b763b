import type { RequirementSet, Revision, Role } from '@polecourt/contracts';
import { parseRequirements } from '@polecourt/spec';
import { type ReactNode, useMemo, useState } from 'react';
import { Link } from 'react-router-dom';

import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { SplanePlot } from '@/components/plots/splane-plot';
import { Sha256Digest } from '@/components/sha256-digest';
import { Alert } from '@/components/ui/alert';
import { Loading } from '@/components/ui/loading';
import { revisionPermissions } from '@/lib/permissions';
import { formatUtc } from '@/utils/format-utc';

import { useRequirementSet } from '../api/get-requirement-set';
import { useRevision } from '../api/get-revision';

import { LimitsTable } from './limits-table';
import { RevisionDiff } from './revision-diff';
import { RevisionEditor } from './revision-editor';
import { formValuesFrom } from './revision-form-schema';
import { RevisionStatusBadge } from './revision-status-badge';
import { WorkflowActions } from './workflow-actions';

/**
 * One revision: the editor while it is a draft and the reader may change it; otherwise the
 * limits, rationale, signature and admissible region, read only. Then the workflow buttons
 * the reader's role and the revision's state allow, and the comparison with another revision.
 */
export function RevisionPage({
  revisionId,
  user,
  header,
}: {
  revisionId: number;
  user: { id: number; role: Role };
  /** The page heading, given the loaded revision and its set (the route adds the product line). */
  header: (revision: Revision, set: RequirementSet) => ReactNode;
}) {
  const revision = useRevision({ id: revisionId });
  const set = useRequirementSet({ id: revision.data?.requirementSetId ?? 0, enabled: revision.isSuccess });
  const [notice, setNotice] = useState<string | null>(null);

  if (revision.isPending || (revision.isSuccess && set.isPending)) return <Loading label="Loading the revision…" />;
  if (revision.isError) return <ErrorPanel error={revision.error} title="The revision could not be loaded" onRetry={() => void revision.refetch()} />;
  if (set.isError) return <ErrorPanel error={set.error} title="Its requirement set could not be loaded" onRetry={() => void set.refetch()} />;

  const r = revision.data;
  const s = set.data!;
  const permissions = revisionPermissions(user, r);
  const inForce = s.revisions.find((x) => x.id === s.currentRevisionId) ?? null;
  const inForceNumber = inForce && inForce.id !== r.id ? inForce.number : null;

  return (
    <div className="flex flex-col gap-8">
      {header(r, s)}
      {notice && (
        <Alert tone="success" className="-mt-4">
          {notice}
        </Alert>
      )}
      {permissions.edit ? (
        <RevisionEditor
          key={r.id}
          target={{ kind: 'update', revision: r }}
          initial={formValuesFrom(r.requirements, r.rationale)}
          actions={({ dirty }) => <WorkflowActions revision={r} permissions={permissions} inForceNumber={inForceNumber} unsavedChanges={dirty} onNotice={setNotice} />}
        />
      ) : (
        <>
          <RevisionReadOnly revision={r} />
          <WorkflowActions revision={r} permissions={permissions} inForceNumber={inForceNumber} onNotice={setNotice} />
        </>
      )}
      <ErrorBoundary fallback={({ error, reset }) => <ErrorPanel error={error} title="The comparison could not be shown" onRetry={reset} />}>
        <RevisionDiff revision={r} revisions={s.revisions} />
      </ErrorBoundary>
    </div>
  );
}

function RevisionReadOnly({ revision }: { revision: Revision }) {
  // Stored requirements were checked on the way in; parse again so the plot gets the defaults filled in.
  const requirements = useMemo(() => {
    try {
      return parseRequirements(revision.requirements);
    } catch {
      return null;
    }
  }, [revision.requirements]);

  return (
    <div className="grid gap-8 lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
      <div className="flex flex-col gap-6">
        <section aria-labelledby="limits-heading">
          <h2 id="limits-heading" className="mb-2 text-lg font-semibold">
            Limits
          </h2>
          <LimitsTable requirements={revision.requirements} />
        </section>
        <section aria-labelledby="rationale-heading">
          <h2 id="rationale-heading" className="mb-1 text-lg font-semibold">
            Rationale
          </h2>
          {revision.rationale ? <p className="text-sm whitespace-pre-line">{revision.rationale}</p> : <p className="text-sm text-ink-muted">None given.</p>}
        </section>
        <section aria-labelledby="record-heading">
          <h2 id="record-heading" className="mb-2 text-lg font-semibold">
            Record
          </h2>
          <dl className="grid grid-cols-[auto_1fr] gap-x-6 gap-y-1.5 text-sm">
            <dt className="text-ink-muted">Status</dt>
            <dd>
              <RevisionStatusBadge status={revision.status} />
            </dd>
            <dt className="text-ink-muted">Written by</dt>
            <dd>
              {revision.author.name} <span className="text-ink-muted">({revision.author.email})</span>
            </dd>
            {revision.submittedAt && (
              <>
                <dt className="text-ink-muted">Submitted</dt>
                <dd>
                  <time dateTime={revision.submittedAt}>{formatUtc(revision.submittedAt)}</time>
                </dd>
              </>
            )}
            {revision.approver && (
              <>
                <dt className="text-ink-muted">Approved by</dt>
                <dd>
                  {revision.approver.name} <span className="text-ink-muted">({revision.approver.email})</span>
                  {revision.approvalMeaning && <span className="text-ink-muted">, signed with the meaning “{revision.approvalMeaning}”</span>}
                </dd>
              </>
            )}
            {revision.approvedAt && (
              <>
                <dt className="text-ink-muted">Approved</dt>
                <dd>
                  <time dateTime={revision.approvedAt}>{formatUtc(revision.approvedAt)}</time>
                </dd>
              </>
            )}
            {revision.retiredAt && (
              <>
                <dt className="text-ink-muted">Retired</dt>
                <dd>
                  <time dateTime={revision.retiredAt}>{formatUtc(revision.retiredAt)}</time>
                </dd>
              </>
            )}
            {revision.sha256 && (
              <>
                <dt className="text-ink-muted">Content fingerprint</dt>
                <dd>
                  <Sha256Digest value={revision.sha256} />
                </dd>
              </>
            )}
            {revision.impact && (
              <>
                <dt className="text-ink-muted">Impact acknowledged</dt>
                <dd>
                  {revision.impact.changed.length} of {revision.impact.total} candidates changed verdict
                  {revision.impact.changed.length > 0 && `: ${revision.impact.changed.map((c) => c.name).join(', ')}`}
                </dd>
              </>
            )}
          </dl>
          {(revision.status === 'approved' || revision.status === 'retired') && (
            <p className="mt-3 text-xs text-ink-muted">An approved revision never changes again. Changes go into a new revision.</p>
          )}
        </section>
      </div>
      <SplanePlot title={`Admissible region of revision ${revision.number}`} requirements={requirements} caption="Dominant poles inside the shaded area meet every limit (second-order view, margin applied)." />
    </div>
  );
}

/** "New revision": the editor prefilled from the revision in force (or the usual settings for a first one). */
export function NewRevisionPage({ set, onCreated }: { set: RequirementSet; onCreated: (revision: Revision) => void }) {
  const inForce = set.revisions.find((r) => r.id === set.currentRevisionId) ?? null;
  const initial = useMemo(() => formValuesFrom(inForce?.requirements ?? null, ''), [inForce]);
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-ink-muted">
        {inForce ? (
          <>
            Starts from the limits of revision {inForce.number}, in force. <Link to={`/revisions/${inForce.id}`} className="text-accent underline underline-offset-2">
              Open revision {inForce.number}
            </Link>
          </>
        ) : (
          'The first revision of this set. It starts with the usual settings: a 2 % settling band and a dominance ratio of 5.'
        )}
      </p>
      <RevisionEditor target={{ kind: 'create', requirementSetId: set.id }} initial={initial} onSaved={(r) => onCreated(r)} />
    </div>
  );
}
