import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PublicCampaignProgress } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { campaignProgressKeys } from './keys';

/** The shareable progress page's figures: no sign-in, counts only. */
export function getPublicCampaignProgress(
  code: string,
  signal?: AbortSignal,
): Promise<PublicCampaignProgress> {
  return apiGet<PublicCampaignProgress>(`/public/campaigns/${encodeURIComponent(code)}/progress`, {
    signal,
    anonymous: true,
  });
}

export function getPublicCampaignProgressQueryOptions(code: string) {
  return queryOptions({
    queryKey: campaignProgressKeys.public(code),
    queryFn: ({ signal }) => getPublicCampaignProgress(code, signal),
  });
}

export function usePublicCampaignProgress(code: string) {
  return useQuery(getPublicCampaignProgressQueryOptions(code));
}
