import { VERIFY_REPORT_MAX_BYTES, type ReportVerification } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

export { VERIFY_REPORT_MAX_BYTES };

export function verifyReport({ file }: { file: File }): Promise<ReportVerification> {
  const body = new FormData();
  body.append('file', file, file.name);
  return api.post<ReportVerification>('/reports/verify', body);
}

export function useVerifyReport({ mutationConfig }: { mutationConfig?: UseMutationOptions<ReportVerification, ApiError, { file: File }> } = {}) {
  return useMutation<ReportVerification, ApiError, { file: File }>({ ...mutationConfig, mutationFn: verifyReport });
}
