import { PageHeader } from '@/components/ui/page-header';
import { useMe } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { AuditTrailOverview } from '@/features/audit-trail/components/audit-trail-overview';
import { can } from '@/lib/permissions';

export default function AuditTrailRoute() {
  const role = useMe().data?.user.role;
  return (
    <>
      <title>Audit trail · Polecourt</title>
      <PageHeader title="Audit trail" lead="Every recorded change, and a check that none is missing or altered." />
      <RequireArea area="audit_trail">
        {() => <AuditTrailOverview canVerify={role ? can(role, 'verify_audit_trail') : false} />}
      </RequireArea>
    </>
  );
}
