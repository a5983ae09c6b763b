import type { Candidate } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

// The assessment view needs the stored design to draw the step response; same request and
// key as the candidate page, so the two share one cache entry.
export function getAssessedCandidate(id: number, signal?: AbortSignal): Promise<Candidate> {
  return api.get<Candidate>(`/candidates/${encodeURIComponent(String(id))}`, signal ? { signal } : {});
}

export function getAssessedCandidateQueryOptions(id: number) {
  return queryOptions({
    queryKey: ['candidates', 'one', id],
    queryFn: ({ signal }) => getAssessedCandidate(id, signal),
  });
}

export function useAssessedCandidate({ id, enabled = true }: { id: number; enabled?: boolean }) {
  return useQuery({ ...getAssessedCandidateQueryOptions(id), enabled });
}
