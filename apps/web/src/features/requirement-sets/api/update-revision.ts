import type { Revision } from '@polecourt/contracts';
import type { RequirementsInput } from '@polecourt/spec';
import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

import { getRequirementSetQueryOptions } from './get-requirement-set';
import { getRevisionQueryOptions } from './get-revision';

export interface UpdateRevisionVariables {
  id: number;
  /** `version` is the one the editor read: the server answers 409 stale_version if someone saved since. */
  data: { requirements: RequirementsInput; rationale: string; version: number };
}

export function updateRevision({ id, data }: UpdateRevisionVariables): Promise<Revision> {
  return api.patch<Revision>(`/revisions/${encodeURIComponent(String(id))}`, data);
}

export function useUpdateRevision({ mutationConfig }: { mutationConfig?: UseMutationOptions<Revision, ApiError, UpdateRevisionVariables> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<Revision, ApiError, UpdateRevisionVariables>({
    ...rest,
    mutationFn: updateRevision,
    onSuccess: async (revision, ...args) => {
      queryClient.setQueryData(getRevisionQueryOptions(revision.id).queryKey, revision);
      // Its diff and impact depend on the limits just saved.
      await queryClient.invalidateQueries({ queryKey: getRevisionQueryOptions(revision.id).queryKey, predicate: (q) => q.queryKey.length > 2 });
      await queryClient.invalidateQueries({ queryKey: getRequirementSetQueryOptions(revision.requirementSetId).queryKey });
      onSuccess?.(revision, ...args);
    },
  });
}
