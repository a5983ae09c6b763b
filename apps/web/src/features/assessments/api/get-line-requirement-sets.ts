import type { ListResponse, RequirementSetSummary } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

const LIMIT = 200;

export function getLineRequirementSets({ productLineId }: { productLineId: number }, signal?: AbortSignal): Promise<ListResponse<RequirementSetSummary>> {
  return api.get<ListResponse<RequirementSetSummary>>(`/product-lines/${encodeURIComponent(String(productLineId))}/requirement-sets`, {
    query: { limit: LIMIT },
    ...(signal ? { signal } : {}),
  });
}

export function getLineRequirementSetsQueryOptions({ productLineId }: { productLineId: number }) {
  return queryOptions({
    // Under 'requirement-sets', so a new set or an approval on the requirement pages refreshes the picker.
    queryKey: ['requirement-sets', 'by-line', productLineId],
    queryFn: ({ signal }) => getLineRequirementSets({ productLineId }, signal),
  });
}

export function useLineRequirementSets({ productLineId, enabled = true }: { productLineId: number; enabled?: boolean }) {
  return useQuery({ ...getLineRequirementSetsQueryOptions({ productLineId }), enabled });
}
