import type { ListResponse, PublicUser } from '@polecourt/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

export const USERS_PAGE_SIZE = 25;

export function getUsers({ page }: { page: number }, signal?: AbortSignal): Promise<ListResponse<PublicUser>> {
  return api.get<ListResponse<PublicUser>>('/users', {
    query: { limit: USERS_PAGE_SIZE, offset: (page - 1) * USERS_PAGE_SIZE },
    ...(signal ? { signal } : {}),
  });
}

export function getUsersQueryOptions({ page = 1 }: { page?: number } = {}) {
  return queryOptions({
    queryKey: ['users', { page }],
    queryFn: ({ signal }) => getUsers({ page }, signal),
  });
}

export function useUsers({ page = 1 }: { page?: number } = {}) {
  // Keep the old page on screen while the next one loads, so the table does not jump.
  return useQuery({ ...getUsersQueryOptions({ page }), placeholderData: keepPreviousData });
}
