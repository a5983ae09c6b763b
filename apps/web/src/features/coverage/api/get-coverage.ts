import type { CoverageFilter, CoverageReport } from '@polecourt/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';

import { env } from '@/config/env';
import { api } from '@/lib/api-client';

export function getCoverage({ productLineId, filter }: { productLineId: number; filter: CoverageFilter }, signal?: AbortSignal): Promise<CoverageReport> {
  return api.get<CoverageReport>(`/product-lines/${encodeURIComponent(String(productLineId))}/coverage`, {
    query: { filter },
    ...(signal ? { signal } : {}),
  });
}

/** The same rows as a CSV file, downloaded by the browser with the session cookie. */
export function coverageCsvUrl({ productLineId, filter }: { productLineId: number; filter: CoverageFilter }): string {
  const query = new URLSearchParams({ filter, format: 'csv' });
  return `${env.apiBaseUrl}/product-lines/${encodeURIComponent(String(productLineId))}/coverage?${query.toString()}`;
}

export function getCoverageQueryOptions({ productLineId, filter = 'all' }: { productLineId: number; filter?: CoverageFilter }) {
  return queryOptions({
    queryKey: ['coverage', { productLineId, filter }],
    queryFn: ({ signal }) => getCoverage({ productLineId, filter }, signal),
  });
}

export function useCoverage({ productLineId, filter }: { productLineId: number; filter: CoverageFilter }) {
  return useQuery({ ...getCoverageQueryOptions({ productLineId, filter }), placeholderData: keepPreviousData });
}
