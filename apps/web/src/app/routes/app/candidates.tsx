import { SafetyCaution } from '@/components/safety-caution';
import { PageHeader } from '@/components/ui/page-header';
import { RequireArea } from '@/features/auth/components/require-area';
import { CandidatesOverview } from '@/features/candidates/components/candidates-overview';

export default function CandidatesRoute() {
  return (
    <>
      <title>Candidates · Polecourt</title>
      <PageHeader title="Candidates" lead="Closed-loop models submitted for a product line, and their assessments." />
      <RequireArea area="candidates">
        {(access) => (
          <div className="flex flex-col gap-6">
            <CandidatesOverview access={access} />
            <SafetyCaution />
          </div>
        )}
      </RequireArea>
    </>
  );
}
