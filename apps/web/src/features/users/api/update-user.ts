import type { PublicUser, UpdateUserInput } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

import { getUsersQueryOptions } from './get-users';

export interface UpdateUserVariables {
  id: number;
  data: UpdateUserInput;
}

export function updateUser({ id, data }: UpdateUserVariables): Promise<PublicUser> {
  return api.patch<PublicUser>(`/users/${encodeURIComponent(String(id))}`, data);
}

export function useUpdateUser({ mutationConfig }: { mutationConfig?: UseMutationOptions<PublicUser, ApiError, UpdateUserVariables> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<PublicUser, ApiError, UpdateUserVariables>({
    ...rest,
    mutationFn: updateUser,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: getUsersQueryOptions().queryKey.slice(0, 1) });
      onSuccess?.(...args);
    },
  });
}
