import type { Revision } from '@polecourt/contracts';
import type { RequirementsInput } from '@polecourt/spec';
import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

import { getRequirementSetQueryOptions } from './get-requirement-set';
import { getRevisionQueryOptions } from './get-revision';

export interface CreateRevisionVariables {
  requirementSetId: number;
  data: { requirements: RequirementsInput; rationale: string };
}

export function createRevision({ requirementSetId, data }: CreateRevisionVariables): Promise<Revision> {
  return api.post<Revision>(`/requirement-sets/${encodeURIComponent(String(requirementSetId))}/revisions`, data);
}

export function useCreateRevision({ mutationConfig }: { mutationConfig?: UseMutationOptions<Revision, ApiError, CreateRevisionVariables> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<Revision, ApiError, CreateRevisionVariables>({
    ...rest,
    mutationFn: createRevision,
    onSuccess: async (revision, ...args) => {
      queryClient.setQueryData(getRevisionQueryOptions(revision.id).queryKey, revision);
      await queryClient.invalidateQueries({ queryKey: getRequirementSetQueryOptions(revision.requirementSetId).queryKey });
      await queryClient.invalidateQueries({ queryKey: ['requirement-sets', 'by-line'] });
      onSuccess?.(revision, ...args);
    },
  });
}
