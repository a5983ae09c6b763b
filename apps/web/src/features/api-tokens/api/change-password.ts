import type { ChangePasswordInput } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

export function changePassword(input: ChangePasswordInput): Promise<void> {
  return api.post<void>('/auth/change-password', input);
}

export function useChangePassword({ mutationConfig }: { mutationConfig?: UseMutationOptions<void, ApiError, ChangePasswordInput> } = {}) {
  return useMutation<void, ApiError, ChangePasswordInput>({ ...mutationConfig, mutationFn: changePassword });
}
