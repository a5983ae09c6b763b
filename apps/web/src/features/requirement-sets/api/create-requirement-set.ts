import { type RequirementSet, type RequirementSetInput, requirementSetInputSchema } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

import { getRequirementSetsQueryOptions } from './get-requirement-sets';

export { requirementSetInputSchema };
export type { RequirementSetInput };

export interface CreateRequirementSetVariables {
  productLineId: number;
  data: RequirementSetInput;
}

export function createRequirementSet({ productLineId, data }: CreateRequirementSetVariables): Promise<RequirementSet> {
  return api.post<RequirementSet>(`/product-lines/${encodeURIComponent(String(productLineId))}/requirement-sets`, data);
}

export function useCreateRequirementSet({ mutationConfig }: { mutationConfig?: UseMutationOptions<RequirementSet, ApiError, CreateRequirementSetVariables> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<RequirementSet, ApiError, CreateRequirementSetVariables>({
    ...rest,
    mutationFn: createRequirementSet,
    onSuccess: async (set, variables, ...args) => {
      await queryClient.invalidateQueries({ queryKey: getRequirementSetsQueryOptions(variables.productLineId).queryKey });
      // The product line's counts change too.
      await queryClient.invalidateQueries({ queryKey: ['product-lines'] });
      onSuccess?.(set, variables, ...args);
    },
  });
}
