import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JobQueueView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

export const jobKeys = {
  all: ['jobs'] as const,
  queues: () => [...jobKeys.all, 'queues'] as const,
};

/** Every background queue with its counts, running and failed jobs, and repeatable ones. */
export function getJobs(signal?: AbortSignal): Promise<JobQueueView[]> {
  return apiGet<JobQueueView[]>('/jobs', { signal });
}

export function getJobsQueryOptions() {
  return queryOptions({
    queryKey: jobKeys.queues(),
    queryFn: ({ signal }) => getJobs(signal),
    staleTime: 0,
  });
}

/** The page polls while it is open (3 s), so progress bars move and finished jobs leave. */
export const JOBS_POLL_MS = 3_000;

export function useJobs({ refetchIntervalMs = JOBS_POLL_MS }: { refetchIntervalMs?: number } = {}) {
  return useQuery({ ...getJobsQueryOptions(), refetchInterval: refetchIntervalMs });
}
