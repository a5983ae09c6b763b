import type { Revision } from '@polecourt/contracts';
import { queryOptions, useQueries, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

export function getRevision(id: number, signal?: AbortSignal): Promise<Revision> {
  return api.get<Revision>(`/revisions/${encodeURIComponent(String(id))}`, signal ? { signal } : {});
}

export function getRevisionQueryOptions(id: number) {
  return queryOptions({
    queryKey: ['revisions', id],
    queryFn: ({ signal }) => getRevision(id, signal),
  });
}

export function useRevision({ id, enabled = true }: { id: number; enabled?: boolean }) {
  return useQuery({ ...getRevisionQueryOptions(id), enabled });
}

/** Several revisions at once (the ones a candidate's assessments cite), fetched side by side. */
export function useRevisions({ ids }: { ids: readonly number[] }) {
  return useQueries({ queries: ids.map((id) => getRevisionQueryOptions(id)) });
}
