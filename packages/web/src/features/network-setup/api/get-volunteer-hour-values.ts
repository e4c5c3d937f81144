import { queryOptions, useQuery } from '@tanstack/react-query';
import type { VolunteerHourValueView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { settingsKeys } from './get-settings';

/** The value of a volunteer hour per data year, newest first, with its published source. */
export function getVolunteerHourValues(signal?: AbortSignal): Promise<VolunteerHourValueView[]> {
  return apiGet<VolunteerHourValueView[]>('/settings/volunteer-hour-values', { signal });
}

export function getVolunteerHourValuesQueryOptions() {
  return queryOptions({
    queryKey: settingsKeys.hourValues(),
    queryFn: ({ signal }) => getVolunteerHourValues(signal),
  });
}

export function useVolunteerHourValues() {
  return useQuery(getVolunteerHourValuesQueryOptions());
}
