import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TraceMeasure, TraceView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { traceKeys } from './keys';

/** A figure's trace: the approved tally revisions behind it, re-added. */
export function getTrace(
  reference: string,
  measure: TraceMeasure | null,
  signal?: AbortSignal,
): Promise<TraceView> {
  return apiGet<TraceView>(`/trace/${encodeURIComponent(reference)}`, {
    params: { measure: measure ?? undefined },
    signal,
  });
}

export function getTraceQueryOptions(reference: string, measure: TraceMeasure | null) {
  return queryOptions({
    queryKey: traceKeys.detail(reference, measure),
    queryFn: ({ signal }) => getTrace(reference, measure, signal),
  });
}

export function useTrace(reference: string, measure: TraceMeasure | null) {
  return useQuery(getTraceQueryOptions(reference, measure));
}
