import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CampaignView, SaveCampaignRequest } from '@tallyloom/core';
import { apiPatch } from '@/lib/api-client';
import { campaignKeys } from './get-campaigns';

export interface UpdateCampaignInput {
  id: number;
  /** Only the fields sent change; `regionId: null` makes the campaign network-wide. */
  changes: Partial<SaveCampaignRequest>;
}

export function updateCampaign({ id, changes }: UpdateCampaignInput): Promise<CampaignView> {
  return apiPatch<CampaignView>(`/campaigns/${id}`, changes);
}

export function useUpdateCampaign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateCampaign,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: campaignKeys.all }),
  });
}
