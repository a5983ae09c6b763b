import type { RequirementSet } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

export function getRequirementSet(id: number, signal?: AbortSignal): Promise<RequirementSet> {
  return api.get<RequirementSet>(`/requirement-sets/${encodeURIComponent(String(id))}`, signal ? { signal } : {});
}

export function getRequirementSetQueryOptions(id: number) {
  return queryOptions({
    queryKey: ['requirement-sets', id],
    queryFn: ({ signal }) => getRequirementSet(id, signal),
  });
}

export function useRequirementSet({ id, enabled = true }: { id: number; enabled?: boolean }) {
  return useQuery({ ...getRequirementSetQueryOptions(id), enabled });
}
