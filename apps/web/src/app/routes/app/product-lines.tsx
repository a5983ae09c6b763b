import type { QueryClient } from '@tanstack/react-query';
import { type LoaderFunctionArgs, useSearchParams } from 'react-router-dom';

import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { PageHeader } from '@/components/ui/page-header';
import { getMeQueryOptions } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { getProductLinesQueryOptions } from '@/features/product-lines/api/get-product-lines';
import { ProductLinesList } from '@/features/product-lines/components/product-lines-list';
import { canView } from '@/lib/permissions';

function pageFrom(value: string | null): number {
  const page = Number(value ?? '1');
  return Number.isInteger(page) && page >= 1 ? page : 1;
}

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const session = await queryClient.ensureQueryData(getMeQueryOptions());
    if (session && canView(session.user.role, 'product_lines')) {
      await queryClient.prefetchQuery(getProductLinesQueryOptions({ page: pageFrom(new URL(request.url).searchParams.get('page')) }));
    }
    return null;
  };

export default function ProductLinesRoute() {
  const [params, setParams] = useSearchParams();
  const page = pageFrom(params.get('page'));
  return (
    <>
      <title>Product lines · Polecourt</title>
      <PageHeader title="Product lines" lead="Product families, their requirement sets and the revisions of each set." />
      <RequireArea area="product_lines">
        {(access) => (
          <ErrorBoundary fallback={({ error, reset }) => <ErrorPanel error={error} onRetry={reset} />}>
            <ProductLinesList canCreate={access === 'write'} page={page} onPageChange={(next) => setParams(next === 1 ? {} : { page: String(next) })} />
          </ErrorBoundary>
        )}
      </RequireArea>
    </>
  );
}
