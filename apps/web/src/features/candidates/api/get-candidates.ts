import type { Candidate, ListResponse } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

// The list is sorted and filtered in the browser, so one request brings the whole line (the API's maximum page).
export const CANDIDATES_LIMIT = 500;

export function getCandidates({ productLineId }: { productLineId: number }, signal?: AbortSignal): Promise<ListResponse<Candidate>> {
  return api.get<ListResponse<Candidate>>(`/product-lines/${encodeURIComponent(String(productLineId))}/candidates`, {
    query: { limit: CANDIDATES_LIMIT },
    ...(signal ? { signal } : {}),
  });
}

export function getCandidatesQueryOptions({ productLineId }: { productLineId: number }) {
  return queryOptions({
    queryKey: ['candidates', { productLineId }],
    queryFn: ({ signal }) => getCandidates({ productLineId }, signal),
  });
}

export function useCandidates({ productLineId }: { productLineId: number }) {
  return useQuery(getCandidatesQueryOptions({ productLineId }));
}
