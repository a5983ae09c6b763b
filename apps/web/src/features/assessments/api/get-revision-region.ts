import type { RegionResponse } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

export function getRevisionRegion(id: number, signal?: AbortSignal): Promise<RegionResponse> {
  return api.get<RegionResponse>(`/revisions/${encodeURIComponent(String(id))}/region`, signal ? { signal } : {});
}

export function getRevisionRegionQueryOptions(id: number) {
  return queryOptions({
    queryKey: ['revisions', id, 'region'],
    queryFn: ({ signal }) => getRevisionRegion(id, signal),
    // A revision that was ever approved never changes, nor does its region.
    staleTime: Infinity,
  });
}

export function useRevisionRegion({ id }: { id: number }) {
  return useQuery(getRevisionRegionQueryOptions(id));
}
