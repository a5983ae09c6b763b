import type { QueryClient } from '@tanstack/react-query';
import { type LoaderFunctionArgs, Link, useNavigate, useParams } from 'react-router-dom';

import { Breadcrumbs } from '@/components/ui/breadcrumbs';
import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { Alert } from '@/components/ui/alert';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { getCandidateAssessmentsQueryOptions } from '@/features/assessments/api/get-candidate-assessments';
import { AssessPanel } from '@/features/assessments/components/assess-panel';
import { CandidateAssessments } from '@/features/assessments/components/candidate-assessments';
import { getMeQueryOptions, useMe } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { getCandidateQueryOptions, useCandidate } from '@/features/candidates/api/get-candidate';
import { useProductLine } from '@/features/candidates/api/get-product-line';
import { CandidateDetails } from '@/features/candidates/components/candidate-details';
import { CandidateReports } from '@/features/reports/components/candidate-reports';
import { can, canView } from '@/lib/permissions';
import { routeId } from '@/lib/route-id';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const session = await queryClient.ensureQueryData(getMeQueryOptions());
    const id = routeId(params.id);
    if (session && id !== null && canView(session.user.role, 'candidates')) {
      await Promise.all([queryClient.prefetchQuery(getCandidateQueryOptions(id)), queryClient.prefetchQuery(getCandidateAssessmentsQueryOptions({ candidateId: id }))]);
    }
    return null;
  };

function panelFallback({ error, reset }: { error: unknown; reset: () => void }) {
  return <ErrorPanel error={error} onRetry={reset} />;
}

export default function CandidateRoute() {
  const id = routeId(useParams().id);
  const navigate = useNavigate();
  const role = useMe().data?.user.role;
  const candidate = useCandidate({ id: id ?? 0 });
  const line = useProductLine({ id: candidate.data?.productLineId ?? 0 });

  if (id === null) {
    return (
      <Alert tone="error" title="There is no such candidate">
        <p>
          The address does not name a candidate. <Link to="/candidates">Back to the candidates</Link>
        </p>
      </Alert>
    );
  }
  const c = candidate.data;
  const mayAssess = role ? can(role, 'run_assessment') : false;

  return (
    <>
      <title>{`${c?.name ?? 'Candidate'} · Polecourt`}</title>
      {c && (
        <Breadcrumbs
          items={[
            { label: 'Candidates', to: '/candidates' },
            { label: line.data?.name ?? 'Product line', to: `/product-lines/${c.productLineId}/candidates` },
          ]}
        />
      )}
      <PageHeader title={c?.name ?? 'Candidate'} lead={line.data ? `A candidate of ${line.data.name}.` : undefined} />
      <RequireArea area="candidates">
        {() =>
          candidate.isPending ? (
            <Loading label="Loading the candidate…" />
          ) : candidate.isError ? (
            <ErrorPanel error={candidate.error} title="The candidate could not be loaded" onRetry={() => void candidate.refetch()} />
          ) : (
            <div className="flex flex-col gap-8">
              <ErrorBoundary fallback={panelFallback}>
                <CandidateDetails candidateId={id} />
              </ErrorBoundary>

              <section aria-labelledby="assessments-heading" className="flex flex-col gap-4">
                <h2 id="assessments-heading" className="text-lg font-semibold">
                  Assessments
                </h2>
                {mayAssess && (
                  <div className="rounded border border-rule bg-paper-raised p-4">
                    <AssessPanel candidateId={id} productLineId={candidate.data.productLineId} onAssessed={(stored) => void navigate(`/assessments/${stored.id}`)} />
                  </div>
                )}
                <ErrorBoundary fallback={panelFallback}>
                  <CandidateAssessments candidateId={id} productLineId={candidate.data.productLineId} />
                </ErrorBoundary>
              </section>

              <section aria-labelledby="reports-heading" className="flex flex-col gap-3">
                <h2 id="reports-heading" className="text-lg font-semibold">
                  Compliance reports
                </h2>
                <ErrorBoundary fallback={panelFallback}>
                  <CandidateReports candidateId={id} />
                </ErrorBoundary>
              </section>
            </div>
          )
        }
      </RequireArea>
    </>
  );
}
