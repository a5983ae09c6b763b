import type { ReportRecord } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';
import { env } from '@/config/env';

export function getReport({ id }: { id: number }, signal?: AbortSignal): Promise<ReportRecord> {
  return api.get<ReportRecord>(`/reports/${encodeURIComponent(String(id))}`, signal ? { signal } : {});
}

export function getReportQueryOptions({ id }: { id: number }) {
  return queryOptions({
    queryKey: ['reports', 'one', id],
    queryFn: ({ signal }) => getReport({ id }, signal),
  });
}

export function useReport({ id }: { id: number }) {
  return useQuery(getReportQueryOptions({ id }));
}

/** The signed PDF (GET /reports/:id/pdf): a plain link, so the browser downloads it with the session cookie. */
export function reportPdfUrl(id: number): string {
  return `${env.apiBaseUrl}/reports/${encodeURIComponent(String(id))}/pdf`;
}
