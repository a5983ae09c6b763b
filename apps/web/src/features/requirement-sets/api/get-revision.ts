import type { Revision } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

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

export function useRevision({ id }: { id: number }) {
  return useQuery(getRevisionQueryOptions(id));
}
