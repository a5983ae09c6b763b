import { COVERAGE_FILTERS, type CoverageFilter } from '@polecourt/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { type LoaderFunctionArgs, Link, useParams, useSearchParams } from 'react-router-dom';

import { Breadcrumbs } from '@/components/ui/breadcrumbs';
import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { Alert } from '@/components/ui/alert';
import { PageHeader } from '@/components/ui/page-header';
import { getMeQueryOptions } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { useProductLine } from '@/features/candidates/api/get-product-line';
import { getCoverageQueryOptions } from '@/features/coverage/api/get-coverage';
import { CoverageView } from '@/features/coverage/components/coverage-view';
import { canView } from '@/lib/permissions';
import { routeId } from '@/lib/route-id';

function filterFrom(value: string | null): CoverageFilter {
  return (COVERAGE_FILTERS as readonly string[]).includes(value ?? '') ? (value as CoverageFilter) : 'all';
}

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    const session = await queryClient.ensureQueryData(getMeQueryOptions());
    const id = routeId(params.id);
    if (session && id !== null && canView(session.user.role, 'candidates')) {
      const filter = filterFrom(new URL(request.url).searchParams.get('filter'));
      await queryClient.prefetchQuery(getCoverageQueryOptions({ productLineId: id, filter }));
    }
    return null;
  };

export default function CoverageRoute() {
  const id = routeId(useParams().id);
  const [params, setParams] = useSearchParams();
  const filter = filterFrom(params.get('filter'));
  const line = useProductLine({ id: id ?? 0 });

  if (id === null) {
    return (
      <Alert tone="error" title="There is no such product line">
        <p>
          <Link to="/candidates">Pick a product line</Link>.
        </p>
      </Alert>
    );
  }
  const name = line.data?.name;
  return (
    <>
      <title>{`Coverage of ${name ?? 'a product line'} · Polecourt`}</title>
      <Breadcrumbs items={[{ label: `Candidates of ${name ?? 'the product line'}`, to: `/product-lines/${id}/candidates` }]} />
      <PageHeader
        title={name ? `Coverage of ${name}` : 'Coverage'}
        lead="Every candidate against each approved revision, with its latest verdict: what still needs assessing, what was only ever assessed against a retired revision, and what does not comply."
      />
      <RequireArea area="candidates">
        {() => (
          <ErrorBoundary fallback={({ error, reset }) => <ErrorPanel error={error} onRetry={reset} />}>
            <CoverageView productLineId={id} filter={filter} onFilterChange={(next) => setParams(next === 'all' ? {} : { filter: next }, { replace: true })} />
          </ErrorBoundary>
        )}
      </RequireArea>
    </>
  );
}
