import type { QueryClient } from '@tanstack/react-query';
import { type LoaderFunctionArgs, useSearchParams } from 'react-router-dom';

import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { PageHeader } from '@/components/ui/page-header';
import { getMeQueryOptions } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { getOutboxQueryOptions } from '@/features/outbox/api/get-outbox';
import { OutboxList } from '@/features/outbox/components/outbox-list';
import { canView } from '@/lib/permissions';

function pageFrom(value: string | null): number {
  const page = Number(value ?? '1');
  return Number.isInteger(page) && page >= 1 ? page : 1;
}

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const session = await queryClient.ensureQueryData(getMeQueryOptions());
    if (session && canView(session.user.role, 'outbox')) {
      const page = pageFrom(new URL(request.url).searchParams.get('page'));
      await queryClient.prefetchQuery(getOutboxQueryOptions({ page }));
    }
    return null;
  };

export default function OutboxRoute() {
  const [params, setParams] = useSearchParams();
  const page = pageFrom(params.get('page'));

  return (
    <>
      <title>Outbox · Polecourt</title>
      <PageHeader
        title="Outbox"
        lead="Every e-mail Polecourt has sent to its local mail service, newest first. With a real mail server configured, messages go there instead."
      />
      <RequireArea area="outbox">
        {() => (
          <ErrorBoundary fallback={({ error, reset }) => <ErrorPanel error={error} onRetry={reset} />}>
            <OutboxList page={page} onPageChange={(next) => setParams(next === 1 ? {} : { page: String(next) })} />
          </ErrorBoundary>
        )}
      </RequireArea>
    </>
  );
}
