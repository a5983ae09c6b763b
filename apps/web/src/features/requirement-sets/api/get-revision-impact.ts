import type { RevisionImpact } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

export function getRevisionImpact(id: number, signal?: AbortSignal): Promise<RevisionImpact> {
  return api.get<RevisionImpact>(`/revisions/${encodeURIComponent(String(id))}/impact`, signal ? { signal } : {});
}

export function getRevisionImpactQueryOptions(id: number) {
  return queryOptions({
    queryKey: ['revisions', id, 'impact'],
    queryFn: ({ signal }) => getRevisionImpact(id, signal),
    // Always fresh when the approve dialog opens: candidates may have been added since.
    staleTime: 0,
  });
}

export function useRevisionImpact({ id, enabled = true }: { id: number; enabled?: boolean }) {
  return useQuery({ ...getRevisionImpactQueryOptions(id), enabled });
}
