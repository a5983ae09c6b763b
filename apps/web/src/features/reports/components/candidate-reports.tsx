import { Alert } from '@/components/ui/alert';
import { Loading } from '@/components/ui/loading';

import { useCandidateReports } from '../api/get-candidate-reports';
import { ReportsTable } from './reports-table';

/** The compliance reports issued for one candidate, for the candidate's and the assessment's pages. */
export function CandidateReports({ candidateId }: { candidateId: number }) {
  const reports = useCandidateReports({ candidateId });
  if (reports.isPending) return <Loading label="Loading the compliance reports…" />;
  if (reports.isError) {
    return (
      <Alert tone="error" title="The compliance reports could not be loaded">
        <p>{reports.error.message}</p>
      </Alert>
    );
  }
  if (reports.data.items.length === 0) return <p className="text-sm text-ink-muted">No compliance report has been issued for this candidate yet.</p>;
  return <ReportsTable reports={reports.data.items} showCandidate={false} />;
}
