import type { QueryClient } from '@tanstack/react-query';
import { type LoaderFunctionArgs, Outlet, redirect, useNavigate } from 'react-router-dom';

import { AppShell } from '@/components/layouts/app-shell';
import { Alert } from '@/components/ui/alert';
import { getMeQueryOptions } from '@/features/auth/api/get-me';
import { useLogout } from '@/features/auth/api/logout';
import { RequireSession } from '@/features/auth/components/require-session';
import { signInPath } from '@/lib/sign-in-path';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const session = await queryClient.ensureQueryData(getMeQueryOptions());
    if (!session) {
      const url = new URL(request.url);
      throw redirect(signInPath(url.pathname + url.search));
    }
    return null;
  };

export default function AppRoot() {
  const navigate = useNavigate();
  const logout = useLogout({ mutationConfig: { onSuccess: () => void navigate('/sign-in', { replace: true }) } });

  return (
    <RequireSession>
      {(session) => (
        <AppShell
          user={session.user}
          onSignOut={() => logout.mutate()}
          signingOut={logout.isPending}
          notice={
            logout.error && (
              <Alert tone="error" title="You are still signed in">
                <p>{logout.error.message}</p>
              </Alert>
            )
          }
        >
          <Outlet />
        </AppShell>
      )}
    </RequireSession>
  );
}
