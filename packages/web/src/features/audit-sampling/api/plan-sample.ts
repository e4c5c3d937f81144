import { keepPreviousData, skipToken, useQuery } from '@tanstack/react-query';
import type { SamplePlanRequest, SamplePlanView } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { sampleKeys } from './keys';

/** A preview: the population counted now and the items a draw would take. Nothing is stored. */
export function planSample(
  request: SamplePlanRequest,
  signal?: AbortSignal,
): Promise<SamplePlanView> {
  return apiPost<SamplePlanView>('/samples/plan', request, { signal });
}

/** The server's preview of a complete plan; asks nothing while the form is incomplete (`null`). */
export function useSamplePlan(request: SamplePlanRequest | null) {
  return useQuery({
    queryKey: sampleKeys.plan(request),
    queryFn: request ? ({ signal }) => planSample(request, signal) : skipToken,
    placeholderData: keepPreviousData,
  });
}
