import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AuditSampleView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { sampleKeys } from './keys';

/** One drawn sample: its seed and plan, the items in draw order and the worksheet so far. */
export function getSample(id: number, signal?: AbortSignal): Promise<AuditSampleView> {
  return apiGet<AuditSampleView>(`/samples/${id}`, { signal });
}

export function getSampleQueryOptions(id: number) {
  return queryOptions({
    queryKey: sampleKeys.detail(id),
    queryFn: ({ signal }) => getSample(id, signal),
  });
}

export function useSample(id: number) {
  return useQuery(getSampleQueryOptions(id));
}
