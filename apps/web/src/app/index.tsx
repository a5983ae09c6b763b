import { RouterProvider } from 'react-router-dom';

import { ME_QUERY_KEY, replaceSession } from '@/features/auth/api/get-me';
import { api } from '@/lib/api-client';
import { createQueryClient } from '@/lib/query-client';

import { AppProvider } from './provider';
import { createAppRouter } from './router';

const queryClient = createQueryClient();
const router = createAppRouter(queryClient);

// The api client's 401 handling, wired to this app's cache and router: forget the session and
// everything fetched with it, then go to sign-in with the current page kept as the way back.
api.setUnauthorizedHooks({
  clearSession: () => {
    if (queryClient.getQueryData(ME_QUERY_KEY) !== null) replaceSession(queryClient, null, { leaving: true });
  },
  redirect: (to) => void router.navigate(to, { replace: true }),
  // During a navigation the page being opened is the one the person wanted.
  currentPath: () => {
    const { pathname, search } = router.state.navigation.location ?? router.state.location;
    return pathname + search;
  },
});

export function App() {
  return (
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>
  );
}
