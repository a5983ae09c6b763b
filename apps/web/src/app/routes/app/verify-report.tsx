import { PageHeader } from '@/components/ui/page-header';
import { RequireArea } from '@/features/auth/components/require-area';
import { VerifyReportPanel } from '@/features/reports/components/verify-report-panel';

export default function VerifyReportRoute() {
  return (
    <>
      <title>Verify a report · Polecourt</title>
      <PageHeader
        title="Verify a report"
        lead="Check a compliance report PDF: is its signature intact, did Polecourt issue exactly this file, and do its numbers still come out the same?"
      />
      <RequireArea area="verify_report">{() => <VerifyReportPanel />}</RequireArea>
    </>
  );
}
