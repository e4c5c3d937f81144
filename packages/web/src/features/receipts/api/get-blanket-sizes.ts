import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BlanketSizeView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

export const blanketSizeKeys = {
  all: ['blanket-sizes'] as const,
  list: () => [...blanketSizeKeys.all, 'list', { includeInactive: false }] as const,
};

/** The sizes in use, in catalogue order: one count per size on the parcel form. */
export function getBlanketSizes(signal?: AbortSignal): Promise<BlanketSizeView[]> {
  return apiGet<BlanketSizeView[]>('/blanket-sizes', { signal });
}

export function getBlanketSizesQueryOptions() {
  return queryOptions({
    queryKey: blanketSizeKeys.list(),
    queryFn: ({ signal }) => getBlanketSizes(signal),
  });
}

export function useBlanketSizes() {
  return useQuery(getBlanketSizesQueryOptions());
}
