import type { QueryClient } from '@tanstack/react-query';
import { type LoaderFunctionArgs, Link, useParams } from 'react-router-dom';

import { Breadcrumbs } from '@/components/ui/breadcrumbs';
import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { Alert } from '@/components/ui/alert';
import { PageHeader } from '@/components/ui/page-header';
import { getMeQueryOptions, useMe } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { getCandidatesQueryOptions } from '@/features/candidates/api/get-candidates';
import { getProductLineQueryOptions, useProductLine } from '@/features/candidates/api/get-product-line';
import { ProductLineCandidates } from '@/features/candidates/components/product-line-candidates';
import { can, canView } from '@/lib/permissions';
import { routeId } from '@/lib/route-id';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const session = await queryClient.ensureQueryData(getMeQueryOptions());
    const id = routeId(params.id);
    if (session && id !== null && canView(session.user.role, 'candidates')) {
      await Promise.all([queryClient.prefetchQuery(getProductLineQueryOptions(id)), queryClient.prefetchQuery(getCandidatesQueryOptions({ productLineId: id }))]);
    }
    return null;
  };

export default function ProductLineCandidatesRoute() {
  const id = routeId(useParams().id);
  const role = useMe().data?.user.role;
  const line = useProductLine({ id: id ?? 0 });
  const name = line.data?.name;

  if (id === null) {
    return (
      <Alert tone="error" title="There is no such product line">
        <p>
          The address does not name a product line. <Link to="/candidates">Pick one from the list</Link>.
        </p>
      </Alert>
    );
  }

  return (
    <>
      <title>{`Candidates of ${name ?? 'a product line'} · Polecourt`}</title>
      <Breadcrumbs items={[{ label: 'Candidates', to: '/candidates' }, { label: name ?? '…' }]} />
      <PageHeader
        title={name ? `Candidates of ${name}` : 'Candidates'}
        lead={line.data?.description || 'Closed-loop models submitted for this product line, and their latest verdicts.'}
        actions={
          <>
            {role && canView(role, 'product_lines') && (
              <Link
                to={`/product-lines/${id}`}
                className="inline-flex items-center rounded border border-rule-strong bg-paper-raised px-4 py-2 text-sm font-medium text-ink hover:border-ink-muted"
              >
                Requirement sets
              </Link>
            )}
            <Link
              to={`/product-lines/${id}/coverage`}
              className="inline-flex items-center rounded border border-rule-strong bg-paper-raised px-4 py-2 text-sm font-medium text-ink hover:border-ink-muted"
            >
              Coverage
            </Link>
          </>
        }
      />
      <RequireArea area="candidates">
        {() =>
          line.isError ? (
            <ErrorPanel error={line.error} title="The product line could not be loaded" onRetry={() => void line.refetch()} />
          ) : (
            <ErrorBoundary fallback={({ error, reset }) => <ErrorPanel error={error} onRetry={reset} />}>
              <ProductLineCandidates productLineId={id} canSubmit={role ? can(role, 'submit_candidate') : false} />
            </ErrorBoundary>
          )
        }
      </RequireArea>
    </>
  );
}
