import { Link, useNavigate, useParams } from 'react-router-dom';

import { Breadcrumbs } from '@/components/ui/breadcrumbs';
import { Alert } from '@/components/ui/alert';
import { PageHeader } from '@/components/ui/page-header';
import { useMe } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { useProductLine } from '@/features/candidates/api/get-product-line';
import { CandidateForm } from '@/features/candidates/components/candidate-form';
import { can } from '@/lib/permissions';
import { routeId } from '@/lib/route-id';

export default function NewCandidateRoute() {
  const id = routeId(useParams().id);
  const navigate = useNavigate();
  const role = useMe().data?.user.role;
  const line = useProductLine({ id: id ?? 0 });
  const back = id === null ? '/candidates' : `/product-lines/${id}/candidates`;

  return (
    <>
      <title>Enter a candidate · Polecourt</title>
      <Breadcrumbs items={[{ label: `Candidates of ${line.data?.name ?? 'the product line'}`, to: back }]} />
      <PageHeader title="Enter a candidate" lead="One closed-loop model, typed in as poles, zeros and gain or as transfer-function coefficients." />
      <RequireArea area="candidates">
        {() =>
          id === null || line.isError ? (
            <Alert tone="error" title="There is no such product line">
              <p>
                <Link to="/candidates">Pick a product line</Link> first.
              </p>
            </Alert>
          ) : role && can(role, 'submit_candidate') ? (
            <CandidateForm productLineId={id} onCreated={(c) => void navigate(`/candidates/${c.id}`)} onCancel={() => void navigate(back)} />
          ) : (
            <Alert tone="info" title="Entering candidates is not part of your role">
              <p>
                Controls engineers and administrators enter candidates. <Link to={back}>Back to the candidates</Link>
              </p>
            </Alert>
          )
        }
      </RequireArea>
    </>
  );
}
