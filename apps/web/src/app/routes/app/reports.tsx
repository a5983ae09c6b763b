import { SafetyCaution } from '@/components/safety-caution';
import { PageHeader } from '@/components/ui/page-header';
import { useMe } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { ReportsOverview } from '@/features/reports/components/reports-overview';
import { can } from '@/lib/permissions';

export default function ReportsRoute() {
  const role = useMe().data?.user.role;
  return (
    <>
      <title>Reports · Polecourt</title>
      <PageHeader title="Reports" lead="Signed compliance reports: issue, download and verify." />
      <RequireArea area="reports">
        {(access) => (
          <div className="flex flex-col gap-6">
            <ReportsOverview access={access} canVerify={role ? can(role, 'verify_report') : false} />
            <SafetyCaution />
          </div>
        )}
      </RequireArea>
    </>
  );
}
