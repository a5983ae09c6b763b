import type { ListResponse, ReportRecord } from '@polecourt/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

export const REPORTS_PAGE_SIZE = 50;

export function getReports({ page }: { page: number }, signal?: AbortSignal): Promise<ListResponse<ReportRecord>> {
  return api.get<ListResponse<ReportRecord>>('/reports', {
    query: { limit: REPORTS_PAGE_SIZE, offset: (page - 1) * REPORTS_PAGE_SIZE },
    ...(signal ? { signal } : {}),
  });
}

export function getReportsQueryOptions({ page = 1 }: { page?: number } = {}) {
  return queryOptions({
    queryKey: ['reports', { page }],
    queryFn: ({ signal }) => getReports({ page }, signal),
  });
}

export function useReports({ page = 1 }: { page?: number } = {}) {
  return useQuery({ ...getReportsQueryOptions({ page }), placeholderData: keepPreviousData });
}
