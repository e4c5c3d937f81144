import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SessionUser } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
  link: (token: string) => [...authKeys.all, 'link', token] as const,
};

/** The signed-in person as the server knows them now (a role may have changed since sign-in). */
export function getMe(signal?: AbortSignal): Promise<SessionUser> {
  return apiGet<SessionUser>('/auth/me', { signal });
}

export function getMeQueryOptions() {
  return queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
  });
}

export function useMe() {
  return useQuery(getMeQueryOptions());
}
