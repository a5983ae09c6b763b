import type { ApiToken } from '@polecourt/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

import { getApiTokensQueryOptions } from './get-api-tokens';

export function revokeApiToken(id: number): Promise<ApiToken> {
  return api.delete<ApiToken>(`/tokens/${id}`);
}

export function useRevokeApiToken() {
  const queryClient = useQueryClient();
  return useMutation<ApiToken, ApiError, number>({
    mutationFn: revokeApiToken,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getApiTokensQueryOptions().queryKey }),
  });
}
