import { approveRevisionSchema, type Revision } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';

import { type ApiError, api } from '@/lib/api-client';

import { invalidateRevision } from './invalidate-revision';

export { approveRevisionSchema };
export type ApproveRevisionInput = z.infer<typeof approveRevisionSchema>;

export interface ApproveRevisionVariables {
  id: number;
  data: ApproveRevisionInput;
}

/** The approver's electronic signature: password re-entered, impact acknowledged, meaning "approved". */
export function approveRevision({ id, data }: ApproveRevisionVariables): Promise<Revision> {
  return api.post<Revision>(`/revisions/${encodeURIComponent(String(id))}/approve`, data);
}

export function useApproveRevision({ mutationConfig }: { mutationConfig?: UseMutationOptions<Revision, ApiError, ApproveRevisionVariables> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<Revision, ApiError, ApproveRevisionVariables>({
    ...rest,
    mutationFn: approveRevision,
    onSuccess: async (revision, ...args) => {
      await invalidateRevision(queryClient, revision);
      onSuccess?.(revision, ...args);
    },
  });
}
