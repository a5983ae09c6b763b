import { Link, useParams } from 'react-router-dom';

import { Breadcrumbs } from '@/components/ui/breadcrumbs';
import { Alert } from '@/components/ui/alert';
import { PageHeader } from '@/components/ui/page-header';
import { useMe } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { useProductLine } from '@/features/candidates/api/get-product-line';
import { UploadPanel } from '@/features/candidates/components/upload-panel';
import { can } from '@/lib/permissions';
import { routeId } from '@/lib/route-id';

export default function UploadCandidatesRoute() {
  const id = routeId(useParams().id);
  const role = useMe().data?.user.role;
  const line = useProductLine({ id: id ?? 0 });
  const back = id === null ? '/candidates' : `/product-lines/${id}/candidates`;

  return (
    <>
      <title>Upload candidates · Polecourt</title>
      <Breadcrumbs items={[{ label: `Candidates of ${line.data?.name ?? 'the product line'}`, to: back }]} />
      <PageHeader title="Upload candidates" lead={`Several candidates at once${line.data ? ` for ${line.data.name}` : ''}, from one JSON or CSV file.`} />
      <RequireArea area="candidates">
        {() =>
          id === null || line.isError ? (
            <Alert tone="error" title="There is no such product line">
              <p>
                <Link to="/candidates">Pick a product line</Link> first.
              </p>
            </Alert>
          ) : role && can(role, 'submit_candidate') ? (
            <UploadPanel productLineId={id} />
          ) : (
            <Alert tone="info" title="Uploading candidates is not part of your role">
              <p>
                Controls engineers and administrators upload candidates. <Link to={back}>Back to the candidates</Link>
              </p>
            </Alert>
          )
        }
      </RequireArea>
    </>
  );
}
