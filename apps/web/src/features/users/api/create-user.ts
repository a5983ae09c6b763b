import type { CreateUserInput, PublicUser } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

import { getUsersQueryOptions } from './get-users';

export function createUser(input: CreateUserInput): Promise<PublicUser> {
  return api.post<PublicUser>('/users', input);
}

export function useCreateUser({ mutationConfig }: { mutationConfig?: UseMutationOptions<PublicUser, ApiError, CreateUserInput> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<PublicUser, ApiError, CreateUserInput>({
    ...rest,
    mutationFn: createUser,
    onSuccess: async (...args) => {
      // Every page of the list may shift, so all of them are refetched ('users' prefix).
      await queryClient.invalidateQueries({ queryKey: getUsersQueryOptions().queryKey.slice(0, 1) });
      onSuccess?.(...args);
    },
  });
}
