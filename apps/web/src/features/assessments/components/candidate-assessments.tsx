import { Link } from 'react-router-dom';

import { ErrorPanel } from '@/components/errors/error-panel';
import { Loading } from '@/components/ui/loading';
import { VerdictBadge } from '@/components/verdict-badge';
import { formatDateTime } from '@/utils/format-date-time';

import { useCandidateAssessments } from '../api/get-candidate-assessments';
import { useLineRequirementSets } from '../api/get-line-requirement-sets';
import { useRevisions } from '../api/get-revision';

/** Every assessment of one candidate, newest first: which revision, when, by whom, the verdict. */
export function CandidateAssessments({ candidateId, productLineId }: { candidateId: number; productLineId: number }) {
  const assessments = useCandidateAssessments({ candidateId });
  const items = assessments.data?.items ?? [];
  const revisionIds = [...new Set(items.map((a) => a.revisionId))];
  const revisions = useRevisions({ ids: revisionIds });
  const sets = useLineRequirementSets({ productLineId });

  if (assessments.isPending) return <Loading label="Loading the assessments…" />;
  if (assessments.isError) return <ErrorPanel error={assessments.error} title="The assessments could not be loaded" onRetry={() => void assessments.refetch()} />;
  if (items.length === 0) return <p className="text-sm text-ink-muted">This candidate has not been assessed yet.</p>;

  const revisionById = new Map(revisions.flatMap((q) => (q.data ? [[q.data.id, q.data] as const] : [])));
  const setName = (setId: number | undefined) => sets.data?.items.find((s) => s.id === setId)?.name ?? null;

  return (
    <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
      <table className="w-full border-collapse text-left text-sm" data-assessments-table="">
        <caption className="sr-only">Assessments of this candidate, newest first</caption>
        <thead className="border-b border-rule bg-paper-sunk text-xs uppercase tracking-wide text-ink-muted">
          <tr>
            <th scope="col" className="px-4 py-2 font-medium">Against</th>
            <th scope="col" className="px-4 py-2 font-medium">When</th>
            <th scope="col" className="px-4 py-2 font-medium">Verdict</th>
            <th scope="col" className="px-4 py-2 font-medium">
              <span className="sr-only">Open</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {items.map((a) => {
            const revision = revisionById.get(a.revisionId);
            const name = setName(revision?.requirementSetId);
            return (
              <tr key={a.id} className="border-b border-rule align-top last:border-b-0">
                <th scope="row" className="px-4 py-2.5 font-normal">
                  {revision ? `Revision ${revision.number}` : `Revision id ${a.revisionId}`}
                  {name && <span className="text-ink-muted"> of {name}</span>}
                  {a.revisionStatus === 'retired' && (
                    <span className="mt-0.5 block text-xs font-medium text-caution">That revision is retired now: this verdict is against an old baseline.</span>
                  )}
                </th>
                <td className="px-4 py-2.5">
                  <time dateTime={a.createdAt}>{formatDateTime(a.createdAt)}</time>
                  <span className="block text-xs text-ink-muted">by {a.createdBy.name}</span>
                </td>
                <td className="px-4 py-2.5">
                  <VerdictBadge verdict={(a.result.verdict as 'compliant' | 'noncompliant' | null) ?? 'noncompliant'} />
                </td>
                <td className="px-4 py-2.5 text-right">
                  <Link to={`/assessments/${a.id}`} className="font-medium text-accent underline underline-offset-2 hover:decoration-2">
                    Open assessment<span className="sr-only"> of {formatDateTime(a.createdAt)}</span>
                  </Link>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
