import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BlanketSizeView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

export interface BlanketSizeListParams {
  /** Also the retired sizes; the server honours it for network admins only. */
  includeInactive?: boolean;
}

export const blanketSizeKeys = {
  all: ['blanket-sizes'] as const,
  lists: () => [...blanketSizeKeys.all, 'list'] as const,
  list: (params: BlanketSizeListParams) => [...blanketSizeKeys.lists(), params] as const,
};

/** The blanket size catalogue in list order, with panels and finished size. */
export function getBlanketSizes(
  params: BlanketSizeListParams,
  signal?: AbortSignal,
): Promise<BlanketSizeView[]> {
  return apiGet<BlanketSizeView[]>('/blanket-sizes', {
    params: { includeInactive: params.includeInactive ? true : undefined },
    signal,
  });
}

export function getBlanketSizesQueryOptions(params: BlanketSizeListParams = {}) {
  return queryOptions({
    queryKey: blanketSizeKeys.list(params),
    queryFn: ({ signal }) => getBlanketSizes(params, signal),
  });
}

export function useBlanketSizes(params: BlanketSizeListParams = {}) {
  return useQuery(getBlanketSizesQueryOptions(params));
}
