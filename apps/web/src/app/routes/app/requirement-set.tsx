import type { QueryClient } from '@tanstack/react-query';
import { type LoaderFunctionArgs, useParams } from 'react-router-dom';

import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { Breadcrumbs } from '@/components/ui/breadcrumbs';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { getMeQueryOptions, useMe } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { useProductLine } from '@/features/product-lines/api/get-product-line';
import { getRequirementSetQueryOptions, useRequirementSet } from '@/features/requirement-sets/api/get-requirement-set';
import { RequirementSetView } from '@/features/requirement-sets/components/requirement-set-view';
import { can, canView } from '@/lib/permissions';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = Number(params.id);
    const session = await queryClient.ensureQueryData(getMeQueryOptions());
    if (session && canView(session.user.role, 'product_lines') && Number.isInteger(id)) await queryClient.prefetchQuery(getRequirementSetQueryOptions(id));
    return null;
  };

export default function RequirementSetRoute() {
  const id = Number(useParams().id);
  const role = useMe().data?.user.role;
  const set = useRequirementSet({ id });
  const line = useProductLine({ id: set.data?.productLineId ?? 0, enabled: set.isSuccess });
  const lineName = set.data && line.data ? line.data.name : 'Product line';

  return (
    <RequireArea area="product_lines">
      {() =>
        set.isPending ? (
          <Loading label="Loading the requirement set…" />
        ) : set.isError ? (
          <ErrorPanel error={set.error} title="The requirement set could not be loaded" onRetry={() => void set.refetch()} />
        ) : (
          <>
            <title>{`${set.data.name} · Polecourt`}</title>
            <Breadcrumbs
              items={[{ label: 'Product lines', to: '/product-lines' }, { label: lineName, to: `/product-lines/${set.data.productLineId}` }, { label: set.data.name }]}
            />
            <PageHeader title={set.data.name} lead={set.data.purpose || 'Requirement set'} />
            <ErrorBoundary fallback={({ error, reset }) => <ErrorPanel error={error} onRetry={reset} />}>
              <RequirementSetView set={set.data} canEdit={role ? can(role, 'edit_requirement_sets') : false} />
            </ErrorBoundary>
          </>
        )
      }
    </RequireArea>
  );
}
