import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { TallyListParams, TallyPage } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

/** Hierarchical keys: a mutation invalidates a whole branch (every list, one detail, …). */
export const tallyKeys = {
  all: ['tallies'] as const,
  lists: () => [...tallyKeys.all, 'list'] as const,
  list: (params: TallyListParams) => [...tallyKeys.lists(), params] as const,
  calendars: () => [...tallyKeys.all, 'calendar'] as const,
  calendar: (chapterId?: number) => [...tallyKeys.calendars(), chapterId ?? 'mine'] as const,
  details: () => [...tallyKeys.all, 'detail'] as const,
  detail: (id: number) => [...tallyKeys.details(), id] as const,
  revisions: (id: number) => [...tallyKeys.detail(id), 'revision'] as const,
  revision: (id: number, revision: number) => [...tallyKeys.revisions(id), revision] as const,
};

/** One page of tallies in the person's scope, filtered and sorted by the server. */
export function getTallies(params: TallyListParams, signal?: AbortSignal): Promise<TallyPage> {
  return apiGet<TallyPage>('/tallies', {
    params: {
      page: params.page,
      pageSize: params.pageSize,
      state: params.state,
      regionId: params.regionId,
      chapterId: params.chapterId,
      month: params.month,
      from: params.from,
      to: params.to,
      sort: params.sort,
      direction: params.direction,
    },
    signal,
  });
}

export function getTalliesQueryOptions(params: TallyListParams) {
  return queryOptions({
    queryKey: tallyKeys.list(params),
    queryFn: ({ signal }) => getTallies(params, signal),
  });
}

export function useTallies(params: TallyListParams, options: { enabled?: boolean } = {}) {
  return useQuery({
    ...getTalliesQueryOptions(params),
    // Keep the current page on screen while the next one loads, so the table does not jump.
    placeholderData: keepPreviousData,
    enabled: options.enabled ?? true,
  });
}
