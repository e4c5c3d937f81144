import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OneTimeLinkInfo } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { authKeys } from './get-me';

/** Who an invitation or reset link is for; 404 when it is unknown, used or expired. */
export function getOneTimeLink(token: string, signal?: AbortSignal): Promise<OneTimeLinkInfo> {
  return apiGet<OneTimeLinkInfo>(`/auth/links/${encodeURIComponent(token)}`, {
    signal,
    anonymous: true,
  });
}

export function getOneTimeLinkQueryOptions(token: string) {
  return queryOptions({
    queryKey: authKeys.link(token),
    queryFn: ({ signal }) => getOneTimeLink(token, signal),
    // A link is used once: checking it again later must ask the server again.
    staleTime: 0,
    gcTime: 0,
  });
}

export function useOneTimeLink(token: string) {
  return useQuery(getOneTimeLinkQueryOptions(token));
}
