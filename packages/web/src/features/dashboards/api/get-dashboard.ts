import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { DashboardParams, DashboardView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

/** Whose figures: the whole network, one region or one chapter. */
export type DashboardTarget =
  { scope: 'network' } | { scope: 'region'; id: number } | { scope: 'chapter'; id: number };

export const dashboardKeys = {
  all: ['dashboards'] as const,
  view: (target: DashboardTarget, params: DashboardParams) =>
    [...dashboardKeys.all, 'view', target, params] as const,
};

function dashboardPath(target: DashboardTarget): string {
  switch (target.scope) {
    case 'region':
      return `/dashboards/regions/${target.id}`;
    case 'chapter':
      return `/dashboards/chapters/${target.id}`;
    default:
      return '/dashboards/network';
  }
}

export function getDashboard(
  target: DashboardTarget,
  params: DashboardParams,
  signal?: AbortSignal,
): Promise<DashboardView> {
  return apiGet<DashboardView>(dashboardPath(target), {
    params: {
      periodKind: params.periodKind,
      period: params.period,
      from: params.from,
      to: params.to,
    },
    signal,
  });
}

export function getDashboardQueryOptions(target: DashboardTarget, params: DashboardParams) {
  return queryOptions({
    queryKey: dashboardKeys.view(target, params),
    queryFn: ({ signal }) => getDashboard(target, params, signal),
  });
}

export function useDashboard(target: DashboardTarget, params: DashboardParams) {
  return useQuery({
    ...getDashboardQueryOptions(target, params),
    // Keep the last period's figures on screen while the next one loads, so the page does not jump.
    placeholderData: keepPreviousData,
  });
}
