import type { ListResponse, ReportRecord } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

export function getCandidateReports({ candidateId }: { candidateId: number }, signal?: AbortSignal): Promise<ListResponse<ReportRecord>> {
  return api.get<ListResponse<ReportRecord>>(`/candidates/${encodeURIComponent(String(candidateId))}/reports`, {
    query: { limit: 100 },
    ...(signal ? { signal } : {}),
  });
}

export function getCandidateReportsQueryOptions({ candidateId }: { candidateId: number }) {
  return queryOptions({
    queryKey: ['reports', 'candidate', candidateId],
    queryFn: ({ signal }) => getCandidateReports({ candidateId }, signal),
  });
}

export function useCandidateReports({ candidateId }: { candidateId: number }) {
  return useQuery(getCandidateReportsQueryOptions({ candidateId }));
}
