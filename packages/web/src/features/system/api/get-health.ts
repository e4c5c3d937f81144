import { queryOptions, useQuery } from '@tanstack/react-query';
import type { HealthReport } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

export const healthKeys = {
  all: ['health'] as const,
  report: () => [...healthKeys.all, 'report'] as const,
};

/** The API answers 503 with the same report when a service is down: that is data, not an error. */
export function getHealth(signal?: AbortSignal): Promise<HealthReport> {
  return apiGet<HealthReport>('/health', { signal, acceptStatuses: [503] });
}

export function getHealthQueryOptions() {
  return queryOptions({
    queryKey: healthKeys.report(),
    queryFn: ({ signal }) => getHealth(signal),
    staleTime: 0,
  });
}

/** Polls while the status page is open, so a recovered service shows without a reload. */
export function useHealth({ refetchIntervalMs = 30_000 }: { refetchIntervalMs?: number } = {}) {
  return useQuery({ ...getHealthQueryOptions(), refetchInterval: refetchIntervalMs });
}
