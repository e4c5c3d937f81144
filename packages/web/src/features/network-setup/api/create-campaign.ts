import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CampaignView, SaveCampaignRequest } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { campaignKeys } from './get-campaigns';

/** Adds a campaign; the code is unique (409). */
export function createCampaign(request: SaveCampaignRequest): Promise<CampaignView> {
  return apiPost<CampaignView>('/campaigns', request);
}

export function useCreateCampaign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCampaign,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: campaignKeys.all }),
  });
}
