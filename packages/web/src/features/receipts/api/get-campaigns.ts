import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CampaignView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

export interface CampaignListParams {
  /** Only campaigns running on this day (YYYY-MM-DD); every campaign in scope when left out. */
  activeOn?: string;
}

export const campaignKeys = {
  all: ['campaigns'] as const,
  list: (params: CampaignListParams) => [...campaignKeys.all, 'list', params] as const,
};

/** Network-wide campaigns and those of the person's region, latest start first. */
export function getCampaigns(
  params: CampaignListParams,
  signal?: AbortSignal,
): Promise<CampaignView[]> {
  return apiGet<CampaignView[]>('/campaigns', { params: { activeOn: params.activeOn }, signal });
}

export function getCampaignsQueryOptions(params: CampaignListParams = {}) {
  return queryOptions({
    queryKey: campaignKeys.list(params),
    queryFn: ({ signal }) => getCampaigns(params, signal),
  });
}

export function useCampaigns(params: CampaignListParams = {}, options: { enabled?: boolean } = {}) {
  return useQuery({ ...getCampaignsQueryOptions(params), enabled: options.enabled ?? true });
}
