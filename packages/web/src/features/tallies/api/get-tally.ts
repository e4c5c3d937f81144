import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TallyDetail } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { tallyKeys } from './get-tallies';

/** One tally: its latest revision, the check context, the review trail and what the person may do. */
export function getTally(id: number, signal?: AbortSignal): Promise<TallyDetail> {
  return apiGet<TallyDetail>(`/tallies/${id}`, { signal });
}

export function getTallyQueryOptions(id: number) {
  return queryOptions({
    queryKey: tallyKeys.detail(id),
    queryFn: ({ signal }) => getTally(id, signal),
  });
}

export function useTally(id: number) {
  return useQuery(getTallyQueryOptions(id));
}
