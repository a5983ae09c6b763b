import type { AuditVerification } from '@polecourt/contracts';
import { useMutation } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

/** Walks the whole chain on the server. A GET, but run on request (it reads every event), never cached. */
export function verifyAuditTrail(): Promise<AuditVerification> {
  return api.get<AuditVerification>('/audit-events/verify');
}

export function useVerifyAuditTrail() {
  return useMutation({ mutationFn: verifyAuditTrail });
}
