import { Navigate, useNavigate, useParams } from 'react-router-dom';

import { ErrorPanel } from '@/components/errors/error-panel';
import { Breadcrumbs } from '@/components/ui/breadcrumbs';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { useMe } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { useProductLine } from '@/features/product-lines/api/get-product-line';
import { useRequirementSet } from '@/features/requirement-sets/api/get-requirement-set';
import { NewRevisionPage } from '@/features/requirement-sets/components/revision-page';
import { can } from '@/lib/permissions';

export default function NewRevisionRoute() {
  const id = Number(useParams().id);
  const navigate = useNavigate();
  const role = useMe().data?.user.role;
  const set = useRequirementSet({ id });
  const line = useProductLine({ id: set.data?.productLineId ?? 0, enabled: set.isSuccess });

  // Read-only roles never see the editor; the set's page is where they belong.
  if (role && !can(role, 'edit_requirement_sets')) return <Navigate to={`/requirement-sets/${id}`} replace />;

  return (
    <RequireArea area="product_lines">
      {() =>
        set.isPending ? (
          <Loading label="Loading the requirement set…" />
        ) : set.isError ? (
          <ErrorPanel error={set.error} title="The requirement set could not be loaded" onRetry={() => void set.refetch()} />
        ) : (
          <>
            <title>{`New revision of ${set.data.name} · Polecourt`}</title>
            <Breadcrumbs
              items={[
                { label: 'Product lines', to: '/product-lines' },
                { label: line.data?.name ?? 'Product line', to: `/product-lines/${set.data.productLineId}` },
                { label: set.data.name, to: `/requirement-sets/${set.data.id}` },
                { label: 'New revision' },
              ]}
            />
            <PageHeader title={`New revision of ${set.data.name}`} lead="A draft: nothing is in force until it is submitted, reviewed and approved by someone else." />
            <NewRevisionPage set={set.data} onCreated={(r) => void navigate(`/revisions/${r.id}`, { replace: true })} />
          </>
        )
      }
    </RequireArea>
  );
}
