import type { QueryClient } from '@tanstack/react-query';
import { type LoaderFunctionArgs, useSearchParams } from 'react-router-dom';

import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { PageHeader } from '@/components/ui/page-header';
import { filtersFromParams, filtersToParams } from '@/features/audit-trail/api/audit-filters';
import { getAuditEventsQueryOptions } from '@/features/audit-trail/api/get-audit-events';
import { getAuditFacetsQueryOptions } from '@/features/audit-trail/api/get-audit-facets';
import { AuditTrailOverview } from '@/features/audit-trail/components/audit-trail-overview';
import { getMeQueryOptions, useMe } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { can, canView } from '@/lib/permissions';

function pageFrom(value: string | null): number {
  const page = Number(value ?? '1');
  return Number.isInteger(page) && page >= 1 ? page : 1;
}

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const session = await queryClient.ensureQueryData(getMeQueryOptions());
    // Prefetch only for a role that may read the trail; others get the "not part of your role" note.
    if (session && canView(session.user.role, 'audit_trail')) {
      const params = new URL(request.url).searchParams;
      await Promise.all([
        queryClient.prefetchQuery(getAuditEventsQueryOptions({ filters: filtersFromParams(params), page: pageFrom(params.get('page')) })),
        queryClient.prefetchQuery(getAuditFacetsQueryOptions()),
      ]);
    }
    return null;
  };

export default function AuditTrailRoute() {
  const [params, setParams] = useSearchParams();
  const role = useMe().data?.user.role;
  const filters = filtersFromParams(params);
  const page = pageFrom(params.get('page'));

  return (
    <>
      <title>Audit trail · Polecourt</title>
      <PageHeader title="Audit trail" lead="Every recorded change, and a check that none is missing or altered." />
      <RequireArea area="audit_trail">
        {() => (
          <ErrorBoundary fallback={({ error, reset }) => <ErrorPanel error={error} onRetry={reset} />}>
            <AuditTrailOverview
              filters={filters}
              page={page}
              canVerify={role ? can(role, 'verify_audit_trail') : false}
              onChange={(next) => setParams({ ...filtersToParams(next.filters), ...(next.page > 1 ? { page: String(next.page) } : {}) })}
            />
          </ErrorBoundary>
        )}
      </RequireArea>
    </>
  );
}
