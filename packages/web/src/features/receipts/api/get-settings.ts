import { queryOptions, useQuery } from '@tanstack/react-query';
import type { NetworkSettings } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

export const settingsKeys = {
  all: ['settings'] as const,
  current: () => [...settingsKeys.all, 'current'] as const,
};

/** The settings in force; the parcel form reads the panel tolerance. */
export function getSettings(signal?: AbortSignal): Promise<NetworkSettings> {
  return apiGet<NetworkSettings>('/settings', { signal });
}

export function getSettingsQueryOptions() {
  return queryOptions({
    queryKey: settingsKeys.current(),
    queryFn: ({ signal }) => getSettings(signal),
  });
}

export function useSettings() {
  return useQuery(getSettingsQueryOptions());
}
