import { type Candidate, candidateInputBaseSchema } from '@polecourt/contracts';
import { designSchema } from '@polecourt/spec';
import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { type ApiError, api } from '@/lib/api-client';

import { getCandidatesQueryOptions } from './get-candidates';

/** What the entry form sends: the contract's name and notes, and a design in the engine's shape. */
export const createCandidateSchema = candidateInputBaseSchema.extend({ design: designSchema });
export type CreateCandidateInput = z.input<typeof createCandidateSchema>;

export interface CreateCandidateVariables {
  productLineId: number;
  data: CreateCandidateInput;
}

export function createCandidate({ productLineId, data }: CreateCandidateVariables): Promise<Candidate> {
  return api.post<Candidate>(`/product-lines/${encodeURIComponent(String(productLineId))}/candidates`, data);
}

export function useCreateCandidate({
  mutationConfig,
}: { mutationConfig?: UseMutationOptions<Candidate, ApiError, CreateCandidateVariables> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<Candidate, ApiError, CreateCandidateVariables>({
    ...rest,
    mutationFn: createCandidate,
    onSuccess: async (...args) => {
      // Every candidate list (and the product lines' candidate counts) may change.
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: getCandidatesQueryOptions({ productLineId: args[1].productLineId }).queryKey }),
        queryClient.invalidateQueries({ queryKey: ['product-lines'] }),
      ]);
      onSuccess?.(...args);
    },
  });
}
