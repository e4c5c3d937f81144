import type { DashboardParams } from '@tallyloom/core';
import { useQueryInUrl } from '@/hooks/use-query-in-url';
import { dashboardSearchParams, parseDashboardQuery } from '../components/period-query';

/** The dashboard's period, kept in the URL so a view can be bookmarked or shared. */
export function useDashboardQuery(): [DashboardParams, (next: DashboardParams) => void] {
  return useQueryInUrl((params) => parseDashboardQuery(params), dashboardSearchParams);
}
