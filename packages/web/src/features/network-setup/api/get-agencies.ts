import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PartnerAgencyView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

export interface AgencyListParams {
  /** Only the agencies this chapter serves. */
  chapterId?: number;
}

export const agencyKeys = {
  all: ['agencies'] as const,
  lists: () => [...agencyKeys.all, 'list'] as const,
  list: (params: AgencyListParams) => [...agencyKeys.lists(), params] as const,
};

/** Partner agencies served by a chapter in the person's scope, by name. */
export function getAgencies(
  params: AgencyListParams,
  signal?: AbortSignal,
): Promise<PartnerAgencyView[]> {
  return apiGet<PartnerAgencyView[]>('/agencies', {
    params: { chapterId: params.chapterId },
    signal,
  });
}

export function getAgenciesQueryOptions(params: AgencyListParams = {}) {
  return queryOptions({
    queryKey: agencyKeys.list(params),
    queryFn: ({ signal }) => getAgencies(params, signal),
  });
}

export function useAgencies(params: AgencyListParams = {}) {
  return useQuery(getAgenciesQueryOptions(params));
}
