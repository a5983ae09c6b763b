import type { ListResponse, RequirementSetSummary } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

// A product line has a handful of requirement sets; one page holds them all.
const LIMIT = 100;

export function getRequirementSets(productLineId: number, signal?: AbortSignal): Promise<ListResponse<RequirementSetSummary>> {
  return api.get<ListResponse<RequirementSetSummary>>(`/product-lines/${encodeURIComponent(String(productLineId))}/requirement-sets`, {
    query: { limit: LIMIT, offset: 0 },
    ...(signal ? { signal } : {}),
  });
}

export function getRequirementSetsQueryOptions(productLineId: number) {
  return queryOptions({
    queryKey: ['requirement-sets', 'by-line', productLineId],
    queryFn: ({ signal }) => getRequirementSets(productLineId, signal),
  });
}

export function useRequirementSets({ productLineId }: { productLineId: number }) {
  return useQuery(getRequirementSetsQueryOptions(productLineId));
}
