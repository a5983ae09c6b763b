import type { QueryClient } from '@tanstack/react-query';
import { type LoaderFunctionArgs, useSearchParams } from 'react-router-dom';

import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { PageHeader } from '@/components/ui/page-header';
import { getMeQueryOptions, useMe } from '@/features/auth/api/get-me';
import { RequireArea } from '@/features/auth/components/require-area';
import { getUsersQueryOptions } from '@/features/users/api/get-users';
import { UsersAdmin } from '@/features/users/components/users-admin';
import { canView } from '@/lib/permissions';

function pageFrom(value: string | null): number {
  const page = Number(value ?? '1');
  return Number.isInteger(page) && page >= 1 ? page : 1;
}

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const session = await queryClient.ensureQueryData(getMeQueryOptions());
    // Prefetch only for a role that may see the list; others get the "not part of your role" note.
    if (session && canView(session.user.role, 'users')) {
      const page = pageFrom(new URL(request.url).searchParams.get('page'));
      await queryClient.prefetchQuery(getUsersQueryOptions({ page }));
    }
    return null;
  };

export default function UsersRoute() {
  const [params, setParams] = useSearchParams();
  const page = pageFrom(params.get('page'));
  const me = useMe().data;

  return (
    <>
      <title>Users · Polecourt</title>
      <PageHeader title="Users" lead="Who may sign in to Polecourt, and with which role." />
      <RequireArea area="users">
        {() =>
          me && (
            <ErrorBoundary fallback={({ error, reset }) => <ErrorPanel error={error} onRetry={reset} />}>
              <UsersAdmin
                currentUserId={me.user.id}
                page={page}
                onPageChange={(next) => setParams(next === 1 ? {} : { page: String(next) })}
              />
            </ErrorBoundary>
          )
        }
      </RequireArea>
    </>
  );
}
