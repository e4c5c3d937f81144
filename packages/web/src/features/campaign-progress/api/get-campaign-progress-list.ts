import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CampaignProgressView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { campaignProgressKeys } from './keys';

/** Every campaign in the person's reach with its progress. */
export function getCampaignProgressList(signal?: AbortSignal): Promise<CampaignProgressView[]> {
  return apiGet<CampaignProgressView[]>('/dashboards/campaigns', { signal });
}

export function getCampaignProgressListQueryOptions() {
  return queryOptions({
    queryKey: campaignProgressKeys.list(),
    queryFn: ({ signal }) => getCampaignProgressList(signal),
  });
}

export function useCampaignProgressList() {
  return useQuery(getCampaignProgressListQueryOptions());
}
