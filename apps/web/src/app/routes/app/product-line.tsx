import type { QueryClient } from '@tanstack/react-query';
import { Link, type LoaderFunctionArgs, useParams } from 'react-router-dom';

import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { Breadcrumbs } from '@/components/ui/breadcrumbs';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { getMeQueryOptions, useMe } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { getProductLineQueryOptions, useProductLine } from '@/features/product-lines/api/get-product-line';
import { EditProductLineButton } from '@/features/product-lines/components/product-line-details';
import { getRequirementSetsQueryOptions } from '@/features/requirement-sets/api/get-requirement-sets';
import { RequirementSetsList } from '@/features/requirement-sets/components/requirement-sets-list';
import { can, canView } from '@/lib/permissions';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = Number(params.id);
    const session = await queryClient.ensureQueryData(getMeQueryOptions());
    if (session && canView(session.user.role, 'product_lines') && Number.isInteger(id)) {
      await Promise.all([queryClient.prefetchQuery(getProductLineQueryOptions(id)), queryClient.prefetchQuery(getRequirementSetsQueryOptions(id))]);
    }
    return null;
  };

export default function ProductLineRoute() {
  const id = Number(useParams().id);
  const role = useMe().data?.user.role;
  const line = useProductLine({ id });
  const canEdit = role ? can(role, 'edit_requirement_sets') : false;
  // Candidates and coverage are the controls side's pages; shown to the roles that may open them.
  const seesCandidates = role ? canView(role, 'candidates') : false;

  return (
    <RequireArea area="product_lines">
      {() =>
        line.isPending ? (
          <Loading label="Loading the product line…" />
        ) : line.isError ? (
          <ErrorPanel error={line.error} title="The product line could not be loaded" onRetry={() => void line.refetch()} />
        ) : (
          <>
            <title>{`${line.data.name} · Polecourt`}</title>
            <Breadcrumbs items={[{ label: 'Product lines', to: '/product-lines' }, { label: line.data.name }]} />
            <PageHeader title={line.data.name} lead={line.data.description || 'No description yet.'} actions={canEdit ? <EditProductLineButton line={line.data} /> : undefined} />
            <div className="flex flex-col gap-8">
              {seesCandidates && (
                <nav aria-label="This product line's candidates" className="flex flex-wrap gap-4 text-sm">
                  <Link to={`/product-lines/${id}/candidates`} className="text-accent underline underline-offset-2">
                    Candidates ({line.data.candidateCount ?? 0})
                  </Link>
                  <Link to={`/product-lines/${id}/coverage`} className="text-accent underline underline-offset-2">
                    Coverage against the revisions in force
                  </Link>
                </nav>
              )}
              <ErrorBoundary fallback={({ error, reset }) => <ErrorPanel error={error} onRetry={reset} />}>
                <RequirementSetsList productLineId={id} canEdit={canEdit} />
              </ErrorBoundary>
            </div>
          </>
        )
      }
    </RequireArea>
  );
}
