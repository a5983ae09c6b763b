import type { ListResponse, ProductLine } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

// The picker on the candidates page lists every product line at once: companies have a handful.
const PICKER_LIMIT = 500;

export function getProductLines(signal?: AbortSignal): Promise<ListResponse<ProductLine>> {
  return api.get<ListResponse<ProductLine>>('/product-lines', { query: { limit: PICKER_LIMIT }, ...(signal ? { signal } : {}) });
}

export function getProductLinesQueryOptions() {
  return queryOptions({
    // Under the 'product-lines' prefix, so a change made on the product-line pages refreshes it too.
    queryKey: ['product-lines', 'picker'],
    queryFn: ({ signal }) => getProductLines(signal),
  });
}

export function useProductLines() {
  return useQuery(getProductLinesQueryOptions());
}
