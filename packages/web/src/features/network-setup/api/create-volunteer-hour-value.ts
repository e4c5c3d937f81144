import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SaveVolunteerHourValueRequest, VolunteerHourValueView } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { settingsKeys } from './get-settings';

/** Adds one data year's value; one per year (409 on dataYear). */
export function createVolunteerHourValue(
  request: SaveVolunteerHourValueRequest,
): Promise<VolunteerHourValueView> {
  return apiPost<VolunteerHourValueView>('/settings/volunteer-hour-values', request);
}

export function useCreateVolunteerHourValue() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createVolunteerHourValue,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: settingsKeys.hourValues() }),
  });
}
