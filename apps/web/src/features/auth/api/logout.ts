import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';

import { type ApiError, api, isApiError } from '@/lib/api-client';

import { replaceSession } from './get-me';

export async function logout(): Promise<void> {
  try {
    await api.post<void>('/auth/logout', undefined, { redirectOn401: false });
  } catch (error) {
    // Already signed out on the server (session expired): the goal is reached.
    if (!(isApiError(error) && error.status === 401)) throw error;
  }
  api.setCsrfToken(null);
}

/**
 * Signs out. When the server cannot be reached the session is kept and the error shown, because
 * the cookie would still be valid and pretending otherwise would leave a signed-in browser behind.
 */
export function useLogout({ mutationConfig }: { mutationConfig?: UseMutationOptions<void, ApiError, void> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<void, ApiError, void>({
    ...rest,
    mutationFn: logout,
    onSuccess: (...args) => {
      // Cleared before the caller navigates, so the sign-in page's loader sees nobody signed in;
      // `leaving` keeps the session guard from adding a second redirect of its own meanwhile.
      replaceSession(queryClient, null, { leaving: true });
      onSuccess?.(...args);
    },
  });
}
