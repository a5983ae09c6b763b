import { type StoredAssessment, createAssessmentSchema } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';

import { type ApiError, api } from '@/lib/api-client';

import { getAssessmentQueryOptions } from './get-assessment';
import { getCandidateAssessmentsQueryOptions } from './get-candidate-assessments';

export { createAssessmentSchema };
export type CreateAssessmentInput = z.input<typeof createAssessmentSchema>;

export interface CreateAssessmentVariables {
  candidateId: number;
  data: CreateAssessmentInput;
}

export function createAssessment({ candidateId, data }: CreateAssessmentVariables): Promise<StoredAssessment> {
  return api.post<StoredAssessment>(`/candidates/${encodeURIComponent(String(candidateId))}/assessments`, createAssessmentSchema.parse(data));
}

export function useCreateAssessment({
  mutationConfig,
}: { mutationConfig?: UseMutationOptions<StoredAssessment, ApiError, CreateAssessmentVariables> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<StoredAssessment, ApiError, CreateAssessmentVariables>({
    ...rest,
    mutationFn: createAssessment,
    onSuccess: async (...args) => {
      const [stored, { candidateId }] = args;
      queryClient.setQueryData(getAssessmentQueryOptions(stored.id).queryKey, stored);
      // The candidate's list, its latest verdicts (candidate lists) and the line's coverage all change.
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: getCandidateAssessmentsQueryOptions({ candidateId }).queryKey }),
        queryClient.invalidateQueries({ queryKey: ['candidates'] }),
        queryClient.invalidateQueries({ queryKey: ['coverage'] }),
      ]);
      onSuccess?.(...args);
    },
  });
}
