import type { ListResponse, ProductLine } from '@polecourt/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

export const PRODUCT_LINES_PAGE_SIZE = 50;

export function getProductLines({ page }: { page: number }, signal?: AbortSignal): Promise<ListResponse<ProductLine>> {
  return api.get<ListResponse<ProductLine>>('/product-lines', {
    query: { limit: PRODUCT_LINES_PAGE_SIZE, offset: (page - 1) * PRODUCT_LINES_PAGE_SIZE },
    ...(signal ? { signal } : {}),
  });
}

export function getProductLinesQueryOptions({ page = 1 }: { page?: number } = {}) {
  return queryOptions({
    queryKey: ['product-lines', 'list', { page }],
    queryFn: ({ signal }) => getProductLines({ page }, signal),
  });
}

export function useProductLines({ page = 1 }: { page?: number } = {}) {
  return useQuery({ ...getProductLinesQueryOptions({ page }), placeholderData: keepPreviousData });
}
