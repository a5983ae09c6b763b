import type { QueryClient } from '@tanstack/react-query';
import { type LoaderFunctionArgs, useParams } from 'react-router-dom';

import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { Breadcrumbs } from '@/components/ui/breadcrumbs';
import { PageHeader } from '@/components/ui/page-header';
import { getMeQueryOptions, useMe } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { useProductLine } from '@/features/product-lines/api/get-product-line';
import { getRevisionQueryOptions } from '@/features/requirement-sets/api/get-revision';
import { RevisionPage } from '@/features/requirement-sets/components/revision-page';
import { RevisionStatusBadge } from '@/features/requirement-sets/components/revision-status-badge';
import { canView } from '@/lib/permissions';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = Number(params.id);
    const session = await queryClient.ensureQueryData(getMeQueryOptions());
    if (session && canView(session.user.role, 'product_lines') && Number.isInteger(id)) await queryClient.prefetchQuery(getRevisionQueryOptions(id));
    return null;
  };

function LineCrumb({ productLineId, setId, setName, number }: { productLineId: number; setId: number; setName: string; number: number }) {
  const line = useProductLine({ id: productLineId });
  return (
    <Breadcrumbs
      items={[
        { label: 'Product lines', to: '/product-lines' },
        { label: line.data?.name ?? 'Product line', to: `/product-lines/${productLineId}` },
        { label: setName, to: `/requirement-sets/${setId}` },
        { label: `Revision ${number}` },
      ]}
    />
  );
}

export default function RevisionRoute() {
  const id = Number(useParams().id);
  const user = useMe().data?.user;
  return (
    <RequireArea area="product_lines">
      {() =>
        user && (
          <ErrorBoundary fallback={({ error, reset }) => <ErrorPanel error={error} onRetry={reset} />}>
            <RevisionPage
              revisionId={id}
              user={user}
              header={(r, s) => (
                <div>
                  <title>{`Revision ${r.number} of ${s.name} · Polecourt`}</title>
                  <LineCrumb productLineId={s.productLineId} setId={s.id} setName={s.name} number={r.number} />
                  <PageHeader
                    title={`Revision ${r.number} of ${s.name}`}
                    lead={
                      <span className="inline-flex flex-wrap items-center gap-2">
                        <RevisionStatusBadge status={r.status} />
                        <span>
                          {r.id === s.currentRevisionId ? 'In force. ' : ''}Written by {r.author.name}.
                        </span>
                      </span>
                    }
                  />
                </div>
              )}
            />
          </ErrorBoundary>
        )
      }
    </RequireArea>
  );
}
