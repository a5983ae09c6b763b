import { type ProductLine, type ProductLineInput, productLineInputSchema } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

import { getProductLinesQueryOptions } from './get-product-lines';

export { productLineInputSchema };
export type { ProductLineInput };

export function createProductLine(input: ProductLineInput): Promise<ProductLine> {
  return api.post<ProductLine>('/product-lines', input);
}

export function useCreateProductLine({ mutationConfig }: { mutationConfig?: UseMutationOptions<ProductLine, ApiError, ProductLineInput> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<ProductLine, ApiError, ProductLineInput>({
    ...rest,
    mutationFn: createProductLine,
    onSuccess: async (...args) => {
      // Every page of the list may shift.
      await queryClient.invalidateQueries({ queryKey: getProductLinesQueryOptions().queryKey.slice(0, 2) });
      onSuccess?.(...args);
    },
  });
}
