import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ListUsersParams, Page, UserView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

export const userKeys = {
  all: ['users'] as const,
  lists: () => [...userKeys.all, 'list'] as const,
  list: (params: ListUsersParams) => [...userKeys.lists(), params] as const,
};

/** One page of people, filtered and paged by the server. */
export function getUsers(params: ListUsersParams, signal?: AbortSignal): Promise<Page<UserView>> {
  return apiGet<Page<UserView>>('/users', {
    params: {
      page: params.page,
      pageSize: params.pageSize,
      search: params.search || undefined,
      role: params.role,
      status: params.status,
    },
    signal,
  });
}

export function getUsersQueryOptions(params: ListUsersParams) {
  return queryOptions({
    queryKey: userKeys.list(params),
    queryFn: ({ signal }) => getUsers(params, signal),
  });
}

export function useUsers(params: ListUsersParams) {
  return useQuery({
    ...getUsersQueryOptions(params),
    // Keep the current page on screen while the next one loads, so the table does not jump.
    placeholderData: keepPreviousData,
  });
}
