import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { type LoaderFunctionArgs, Link, useParams } from 'react-router-dom';

import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { getAssessmentQueryOptions, useAssessment } from '@/features/assessments/api/get-assessment';
import { AssessmentView } from '@/features/assessments/components/assessment-view';
import { getMeQueryOptions, useMe } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { CandidateReports } from '@/features/reports/components/candidate-reports';
import { IssueReportDialog } from '@/features/reports/components/issue-report-dialog';
import { can, canView } from '@/lib/permissions';
import { routeId } from '@/lib/route-id';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const session = await queryClient.ensureQueryData(getMeQueryOptions());
    const id = routeId(params.id);
    if (session && id !== null && canView(session.user.role, 'candidates')) await queryClient.prefetchQuery(getAssessmentQueryOptions(id));
    return null;
  };

export default function AssessmentRoute() {
  const id = routeId(useParams().id);
  const role = useMe().data?.user.role;
  const [issuing, setIssuing] = useState(false);
  const assessment = useAssessment({ id: id ?? 0 });

  if (id === null) {
    return (
      <Alert tone="error" title="There is no such assessment">
        <p>
          The address does not name an assessment. <Link to="/candidates">Back to the candidates</Link>
        </p>
      </Alert>
    );
  }
  const maySign = role ? can(role, 'sign_report') : false;
  const candidateId = assessment.data?.candidateId ?? null;

  return (
    <RequireArea area="candidates">
      {() => (
        <AssessmentView
          assessmentId={id}
          actions={
            maySign && assessment.data ? (
              <Button variant="primary" onClick={() => setIssuing(true)}>
                Issue compliance report
              </Button>
            ) : undefined
          }
        >
          {candidateId !== null && (
            <section aria-labelledby="reports-heading" className="flex flex-col gap-3">
              <h2 id="reports-heading" className="text-lg font-semibold">
                Compliance reports of this candidate
              </h2>
              <ErrorBoundary fallback={({ error, reset }) => <ErrorPanel error={error} onRetry={reset} />}>
                <CandidateReports candidateId={candidateId} />
              </ErrorBoundary>
            </section>
          )}
          {maySign && <IssueReportDialog assessmentId={id} open={issuing} onClose={() => setIssuing(false)} />}
        </AssessmentView>
      )}
    </RequireArea>
  );
}
