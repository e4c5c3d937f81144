import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RegionView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

export const regionKeys = {
  all: ['regions'] as const,
  list: () => [...regionKeys.all, 'list'] as const,
};

/** Regions of the network, sorted by name by the server. */
export function getRegions(signal?: AbortSignal): Promise<RegionView[]> {
  return apiGet<RegionView[]>('/regions', { signal });
}

export function getRegionsQueryOptions() {
  return queryOptions({
    queryKey: regionKeys.list(),
    queryFn: ({ signal }) => getRegions(signal),
  });
}

export function useRegions() {
  return useQuery(getRegionsQueryOptions());
}
