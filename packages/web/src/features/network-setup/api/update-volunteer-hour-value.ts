import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SaveVolunteerHourValueRequest, VolunteerHourValueView } from '@tallyloom/core';
import { apiPatch } from '@/lib/api-client';
import { settingsKeys } from './get-settings';

export interface UpdateVolunteerHourValueInput {
  id: number;
  changes: Partial<SaveVolunteerHourValueRequest>;
}

export function updateVolunteerHourValue({
  id,
  changes,
}: UpdateVolunteerHourValueInput): Promise<VolunteerHourValueView> {
  return apiPatch<VolunteerHourValueView>(`/settings/volunteer-hour-values/${id}`, changes);
}

export function useUpdateVolunteerHourValue() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateVolunteerHourValue,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: settingsKeys.hourValues() }),
  });
}
