import type { ListResponse, ReportRecord } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

export function getProductLineReports({ productLineId }: { productLineId: number }, signal?: AbortSignal): Promise<ListResponse<ReportRecord>> {
  return api.get<ListResponse<ReportRecord>>(`/product-lines/${encodeURIComponent(String(productLineId))}/reports`, {
    query: { limit: 200 },
    ...(signal ? { signal } : {}),
  });
}

export function getProductLineReportsQueryOptions({ productLineId }: { productLineId: number }) {
  return queryOptions({
    queryKey: ['reports', 'product-line', productLineId],
    queryFn: ({ signal }) => getProductLineReports({ productLineId }, signal),
  });
}

export function useProductLineReports({ productLineId }: { productLineId: number }) {
  return useQuery(getProductLineReportsQueryOptions({ productLineId }));
}
