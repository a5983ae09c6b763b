import type { ProductLine } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

import { getProductLineQueryOptions } from './get-product-line';
import { getProductLinesQueryOptions } from './get-product-lines';

export interface UpdateProductLineVariables {
  id: number;
  data: { name?: string; description?: string };
}

export function updateProductLine({ id, data }: UpdateProductLineVariables): Promise<ProductLine> {
  return api.patch<ProductLine>(`/product-lines/${encodeURIComponent(String(id))}`, data);
}

export function useUpdateProductLine({ mutationConfig }: { mutationConfig?: UseMutationOptions<ProductLine, ApiError, UpdateProductLineVariables> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<ProductLine, ApiError, UpdateProductLineVariables>({
    ...rest,
    mutationFn: updateProductLine,
    onSuccess: async (line, ...args) => {
      queryClient.setQueryData(getProductLineQueryOptions(line.id).queryKey, line);
      await queryClient.invalidateQueries({ queryKey: getProductLinesQueryOptions().queryKey.slice(0, 2) });
      onSuccess?.(line, ...args);
    },
  });
}
