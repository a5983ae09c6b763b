import type { UploadReport } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';

import { type ApiError, api, isApiError } from '@/lib/api-client';

import { getCandidatesQueryOptions } from './get-candidates';

/** Largest file the API accepts (apps/api candidate routes: 2 MB). */
export const MAX_UPLOAD_BYTES = 2 * 1024 * 1024;

export interface UploadCandidatesVariables {
  productLineId: number;
  file: File;
}

function isUploadReport(value: unknown): value is UploadReport {
  if (typeof value !== 'object' || value === null) return false;
  const v = value as Record<string, unknown>;
  return Array.isArray(v.accepted) && Array.isArray(v.rejected);
}

/**
 * The per-row report of an upload. When every row is rejected the API answers 400
 * `upload_rejected` with the same report beside the error; that is a report to show, not a failure.
 */
export async function uploadCandidates({ productLineId, file }: UploadCandidatesVariables): Promise<UploadReport> {
  const form = new FormData();
  form.append('file', file, file.name);
  try {
    return await api.post<UploadReport>(`/product-lines/${encodeURIComponent(String(productLineId))}/candidates`, form);
  } catch (error) {
    if (isApiError(error) && error.code === 'upload_rejected' && isUploadReport(error.body)) {
      return { accepted: error.body.accepted, rejected: error.body.rejected };
    }
    throw error;
  }
}

export function useUploadCandidates({
  mutationConfig,
}: { mutationConfig?: UseMutationOptions<UploadReport, ApiError, UploadCandidatesVariables> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<UploadReport, ApiError, UploadCandidatesVariables>({
    ...rest,
    mutationFn: uploadCandidates,
    onSuccess: async (...args) => {
      if (args[0].accepted.length > 0) {
        await Promise.all([
          queryClient.invalidateQueries({ queryKey: getCandidatesQueryOptions({ productLineId: args[1].productLineId }).queryKey }),
          queryClient.invalidateQueries({ queryKey: ['product-lines'] }),
        ]);
      }
      onSuccess?.(...args);
    },
  });
}
