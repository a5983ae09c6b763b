import type { RequestResetInput, RequestResetReply } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

export function requestReset(input: RequestResetInput): Promise<RequestResetReply> {
  return api.post<RequestResetReply>('/auth/request-reset', input, { redirectOn401: false });
}

export function useRequestReset({ mutationConfig }: { mutationConfig?: UseMutationOptions<RequestResetReply, ApiError, RequestResetInput> } = {}) {
  return useMutation<RequestResetReply, ApiError, RequestResetInput>({ ...mutationConfig, mutationFn: requestReset });
}
