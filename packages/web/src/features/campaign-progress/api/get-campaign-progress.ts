import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CampaignProgressView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { campaignProgressKeys } from './keys';

export function getCampaignProgress(
  id: number,
  signal?: AbortSignal,
): Promise<CampaignProgressView> {
  return apiGet<CampaignProgressView>(`/dashboards/campaigns/${id}`, { signal });
}

export function getCampaignProgressQueryOptions(id: number) {
  return queryOptions({
    queryKey: campaignProgressKeys.detail(id),
    queryFn: ({ signal }) => getCampaignProgress(id, signal),
  });
}

export function useCampaignProgress(id: number) {
  return useQuery(getCampaignProgressQueryOptions(id));
}
