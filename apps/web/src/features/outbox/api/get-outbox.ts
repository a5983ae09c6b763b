import type { ListResponse, OutboxMessage } from '@polecourt/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

export const OUTBOX_PAGE_SIZE = 25;

export function getOutbox({ page }: { page: number }, signal?: AbortSignal): Promise<ListResponse<OutboxMessage>> {
  return api.get<ListResponse<OutboxMessage>>('/outbox', {
    query: { limit: OUTBOX_PAGE_SIZE, offset: (page - 1) * OUTBOX_PAGE_SIZE },
    ...(signal ? { signal } : {}),
  });
}

export function getOutboxQueryOptions({ page = 1 }: { page?: number } = {}) {
  return queryOptions({
    queryKey: ['outbox', { page }],
    queryFn: ({ signal }) => getOutbox({ page }, signal),
  });
}

export function useOutbox({ page = 1 }: { page?: number } = {}) {
  // Keep the old page on screen while the next one loads, so the list does not jump.
  return useQuery({ ...getOutboxQueryOptions({ page }), placeholderData: keepPreviousData });
}
