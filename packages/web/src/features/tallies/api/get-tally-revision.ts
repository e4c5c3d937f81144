import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TallyRevisionView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { tallyKeys } from './get-tallies';

/** One revision of a tally with its values, e.g. an approved one an amendment replaced. */
export function getTallyRevision(
  id: number,
  revision: number,
  signal?: AbortSignal,
): Promise<TallyRevisionView> {
  return apiGet<TallyRevisionView>(`/tallies/${id}/revisions/${revision}`, { signal });
}

export function getTallyRevisionQueryOptions(id: number, revision: number) {
  return queryOptions({
    queryKey: tallyKeys.revision(id, revision),
    queryFn: ({ signal }) => getTallyRevision(id, revision, signal),
  });
}

export function useTallyRevision(
  id: number,
  revision: number,
  options: { enabled?: boolean } = {},
) {
  return useQuery({
    ...getTallyRevisionQueryOptions(id, revision),
    enabled: options.enabled ?? true,
  });
}
