import type { CreateApiTokenInput, CreatedApiToken } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

import { getApiTokensQueryOptions } from './get-api-tokens';

export function createApiToken(input: CreateApiTokenInput): Promise<CreatedApiToken> {
  return api.post<CreatedApiToken>('/tokens', input);
}

export function useCreateApiToken({ mutationConfig }: { mutationConfig?: UseMutationOptions<CreatedApiToken, ApiError, CreateApiTokenInput> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<CreatedApiToken, ApiError, CreateApiTokenInput>({
    ...rest,
    mutationFn: createApiToken,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: getApiTokensQueryOptions().queryKey });
      onSuccess?.(...args);
    },
  });
}
