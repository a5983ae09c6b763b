import type { StoredAssessment } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

export function getAssessment(id: number, signal?: AbortSignal): Promise<StoredAssessment> {
  return api.get<StoredAssessment>(`/assessments/${encodeURIComponent(String(id))}`, signal ? { signal } : {});
}

export function getAssessmentQueryOptions(id: number) {
  return queryOptions({
    queryKey: ['assessments', id],
    queryFn: ({ signal }) => getAssessment(id, signal),
  });
}

export function useAssessment({ id }: { id: number }) {
  return useQuery({ ...getAssessmentQueryOptions(id), enabled: id > 0 });
}
