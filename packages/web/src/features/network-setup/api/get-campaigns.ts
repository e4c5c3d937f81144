import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CampaignView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

export const campaignKeys = {
  all: ['campaigns'] as const,
  lists: () => [...campaignKeys.all, 'list'] as const,
  list: () => [...campaignKeys.lists(), {}] as const,
};

/** Network-wide campaigns and those of the person's region, latest start first. */
export function getCampaigns(signal?: AbortSignal): Promise<CampaignView[]> {
  return apiGet<CampaignView[]>('/campaigns', { signal });
}

export function getCampaignsQueryOptions() {
  return queryOptions({
    queryKey: campaignKeys.list(),
    queryFn: ({ signal }) => getCampaigns(signal),
  });
}

export function useCampaigns() {
  return useQuery(getCampaignsQueryOptions());
}
