import type { AuditEvent, ListResponse } from '@polecourt/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import { type AuditFilters, filtersToQuery } from './audit-filters';

export const AUDIT_PAGE_SIZE = 25;

export function getAuditEvents({ filters, page }: { filters: AuditFilters; page: number }, signal?: AbortSignal): Promise<ListResponse<AuditEvent>> {
  return api.get<ListResponse<AuditEvent>>('/audit-events', {
    query: { ...filtersToQuery(filters), limit: AUDIT_PAGE_SIZE, offset: (page - 1) * AUDIT_PAGE_SIZE },
    ...(signal ? { signal } : {}),
  });
}

export function getAuditEventsQueryOptions({ filters = {}, page = 1 }: { filters?: AuditFilters; page?: number } = {}) {
  return queryOptions({
    queryKey: ['audit-events', { filters, page }],
    queryFn: ({ signal }) => getAuditEvents({ filters, page }, signal),
  });
}

export function useAuditEvents({ filters = {}, page = 1 }: { filters?: AuditFilters; page?: number } = {}) {
  // The old page stays on screen while the next one loads, so the table does not jump.
  return useQuery({ ...getAuditEventsQueryOptions({ filters, page }), placeholderData: keepPreviousData });
}
