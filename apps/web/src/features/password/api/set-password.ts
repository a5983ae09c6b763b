import type { SetPasswordInput, SetPasswordReply } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

export function setPassword(input: SetPasswordInput): Promise<SetPasswordReply> {
  // Used signed out: nothing here means "session gone".
  return api.post<SetPasswordReply>('/auth/set-password', input, { redirectOn401: false });
}

export function useSetPassword({ mutationConfig }: { mutationConfig?: UseMutationOptions<SetPasswordReply, ApiError, SetPasswordInput> } = {}) {
  return useMutation<SetPasswordReply, ApiError, SetPasswordInput>({ ...mutationConfig, mutationFn: setPassword });
}
