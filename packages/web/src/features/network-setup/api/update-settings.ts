import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { NetworkSettings } from '@tallyloom/core';
import { apiPut } from '@/lib/api-client';
import { settingsKeys } from './get-settings';

/** Replaces the settings whole; every field is required. */
export function updateSettings(settings: NetworkSettings): Promise<NetworkSettings> {
  return apiPut<NetworkSettings>('/settings', settings);
}

export function useUpdateSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSettings,
    onSuccess: (saved) => {
      queryClient.setQueryData(settingsKeys.current(), saved);
      return queryClient.invalidateQueries({ queryKey: settingsKeys.current() });
    },
  });
}
