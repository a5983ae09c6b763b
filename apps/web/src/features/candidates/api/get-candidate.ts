import type { Candidate } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

export function getCandidate(id: number, signal?: AbortSignal): Promise<Candidate> {
  return api.get<Candidate>(`/candidates/${encodeURIComponent(String(id))}`, signal ? { signal } : {});
}

export function getCandidateQueryOptions(id: number) {
  return queryOptions({
    queryKey: ['candidates', 'one', id],
    queryFn: ({ signal }) => getCandidate(id, signal),
  });
}

export function useCandidate({ id }: { id: number }) {
  return useQuery({ ...getCandidateQueryOptions(id), enabled: id > 0 });
}
