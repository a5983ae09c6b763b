import type { SessionInfo } from '@polecourt/contracts';
import { type QueryClient, queryOptions, useQuery } from '@tanstack/react-query';

import { api, isApiError } from '@/lib/api-client';

/** The signed-in person, or null when nobody is signed in (a normal state, not an error). */
export async function getMe(signal?: AbortSignal): Promise<SessionInfo | null> {
  try {
    const session = await api.get<SessionInfo>('/auth/me', { redirectOn401: false, ...(signal ? { signal } : {}) });
    api.setCsrfToken(session.csrfToken);
    return session;
  } catch (error) {
    if (isApiError(error) && error.status === 401) {
      api.setCsrfToken(null);
      return null;
    }
    throw error;
  }
}

export const ME_QUERY_KEY = ['me'] as const;

export function getMeQueryOptions() {
  return queryOptions({
    queryKey: ME_QUERY_KEY,
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });
}

export function useMe() {
  return useQuery(getMeQueryOptions());
}

// True while a sign-out or a 401 redirect is taking the person to the sign-in page. React Router
// commits its navigation state in a transition, later than the cache update, so the session guard
// cannot rely on useNavigation() to know that somebody else is already redirecting.
let leaving = false;

export function isLeavingSession(): boolean {
  return leaving;
}

/** Called by the sign-in page once it is reached: the redirect is over. */
export function sessionLeft(): void {
  leaving = false;
}

/**
 * Forgets everything fetched for the previous person, then records who is signed in now (or nobody).
 * Pass `{ leaving: true }` when the caller has already started the navigation to the sign-in page.
 */
export function replaceSession(queryClient: QueryClient, session: SessionInfo | null, opts: { leaving?: boolean } = {}): void {
  leaving = session === null && opts.leaving === true;
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== ME_QUERY_KEY[0] });
  queryClient.setQueryData(ME_QUERY_KEY, session);
}
