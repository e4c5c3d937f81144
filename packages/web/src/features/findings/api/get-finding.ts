import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FindingView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { findingKeys } from './keys';

/** One finding with its links and responses, oldest response first. */
export function getFinding(id: number, signal?: AbortSignal): Promise<FindingView> {
  return apiGet<FindingView>(`/findings/${id}`, { signal });
}

export function getFindingQueryOptions(id: number) {
  return queryOptions({
    queryKey: findingKeys.detail(id),
    queryFn: ({ signal }) => getFinding(id, signal),
  });
}

export function useFinding(id: number) {
  return useQuery(getFindingQueryOptions(id));
}
