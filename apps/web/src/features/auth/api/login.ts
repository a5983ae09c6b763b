import type { LoginInput, SessionInfo } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

import { replaceSession } from './get-me';

export async function login(input: LoginInput): Promise<SessionInfo> {
  // A 401 here means a wrong e-mail or password: the form shows it, nobody is redirected.
  const session = await api.post<SessionInfo>('/auth/login', input, { redirectOn401: false });
  api.setCsrfToken(session.csrfToken);
  return session;
}

export function useLogin({ mutationConfig }: { mutationConfig?: UseMutationOptions<SessionInfo, ApiError, LoginInput> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<SessionInfo, ApiError, LoginInput>({
    ...rest,
    mutationFn: login,
    onSuccess: (session, ...args) => {
      replaceSession(queryClient, session);
      onSuccess?.(session, ...args);
    },
  });
}
