import type { ProductLine } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

export function getProductLine(id: number, signal?: AbortSignal): Promise<ProductLine> {
  return api.get<ProductLine>(`/product-lines/${encodeURIComponent(String(id))}`, signal ? { signal } : {});
}

export function getProductLineQueryOptions(id: number) {
  return queryOptions({
    queryKey: ['product-lines', id],
    queryFn: ({ signal }) => getProductLine(id, signal),
  });
}

export function useProductLine({ id, enabled = true }: { id: number; enabled?: boolean }) {
  return useQuery({ ...getProductLineQueryOptions(id), enabled });
}
