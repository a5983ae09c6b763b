import type { ListResponse, StoredAssessment } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

const LIMIT = 200;

export function getCandidateAssessments({ candidateId }: { candidateId: number }, signal?: AbortSignal): Promise<ListResponse<StoredAssessment>> {
  return api.get<ListResponse<StoredAssessment>>(`/candidates/${encodeURIComponent(String(candidateId))}/assessments`, {
    query: { limit: LIMIT },
    ...(signal ? { signal } : {}),
  });
}

export function getCandidateAssessmentsQueryOptions({ candidateId }: { candidateId: number }) {
  return queryOptions({
    queryKey: ['assessments', { candidateId }],
    queryFn: ({ signal }) => getCandidateAssessments({ candidateId }, signal),
  });
}

export function useCandidateAssessments({ candidateId }: { candidateId: number }) {
  return useQuery(getCandidateAssessmentsQueryOptions({ candidateId }));
}
