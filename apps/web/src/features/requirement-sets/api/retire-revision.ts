import type { Revision } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

import { invalidateRevision } from './invalidate-revision';

export function retireRevision({ id }: { id: number }): Promise<Revision> {
  return api.post<Revision>(`/revisions/${encodeURIComponent(String(id))}/retire`);
}

export function useRetireRevision({ mutationConfig }: { mutationConfig?: UseMutationOptions<Revision, ApiError, { id: number }> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<Revision, ApiError, { id: number }>({
    ...rest,
    mutationFn: retireRevision,
    onSuccess: async (revision, ...args) => {
      await invalidateRevision(queryClient, revision);
      onSuccess?.(revision, ...args);
    },
  });
}
