import type { ApiToken, ListResponse } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

export function getApiTokens(signal?: AbortSignal): Promise<ListResponse<ApiToken>> {
  return api.get<ListResponse<ApiToken>>('/tokens', { query: { limit: 200 }, ...(signal ? { signal } : {}) });
}

export function getApiTokensQueryOptions() {
  return queryOptions({ queryKey: ['api-tokens'], queryFn: ({ signal }) => getApiTokens(signal) });
}

export function useApiTokens() {
  return useQuery(getApiTokensQueryOptions());
}
