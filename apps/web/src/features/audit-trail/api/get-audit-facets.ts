import type { AuditFacets } from '@polecourt/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

/** The actions, actors and product lines the trail mentions: the choices of the filter selects. */
export function getAuditFacets(signal?: AbortSignal): Promise<AuditFacets> {
  return api.get<AuditFacets>('/audit-events/facets', signal ? { signal } : {});
}

export function getAuditFacetsQueryOptions() {
  return queryOptions({
    queryKey: ['audit-events', 'facets'],
    queryFn: ({ signal }) => getAuditFacets(signal),
  });
}

export function useAuditFacets() {
  return useQuery(getAuditFacetsQueryOptions());
}
