import type { RevisionDiff } from '@polecourt/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

/** `against` left out: the server's default (the revision in force, or the one this one replaced). */
export function getRevisionDiff(id: number, against: number | null, signal?: AbortSignal): Promise<RevisionDiff> {
  return api.get<RevisionDiff>(`/revisions/${encodeURIComponent(String(id))}/diff`, {
    query: { against: against ?? undefined },
    ...(signal ? { signal } : {}),
  });
}

export function getRevisionDiffQueryOptions(id: number, against: number | null = null) {
  return queryOptions({
    queryKey: ['revisions', id, 'diff', { against }],
    queryFn: ({ signal }) => getRevisionDiff(id, against, signal),
  });
}

export function useRevisionDiff({ id, against = null }: { id: number; against?: number | null }) {
  return useQuery({ ...getRevisionDiffQueryOptions(id, against), placeholderData: keepPreviousData });
}
