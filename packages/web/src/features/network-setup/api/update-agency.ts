import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PartnerAgencyView, SavePartnerAgencyRequest } from '@tallyloom/core';
import { apiPatch } from '@/lib/api-client';
import { agencyKeys } from './get-agencies';

export interface UpdateAgencyInput {
  id: number;
  /** Only the fields sent change; `chapterIds` replaces the whole list; `active` (de)activates. */
  changes: Partial<SavePartnerAgencyRequest>;
}

export function updateAgency({ id, changes }: UpdateAgencyInput): Promise<PartnerAgencyView> {
  return apiPatch<PartnerAgencyView>(`/agencies/${id}`, changes);
}

export function useUpdateAgency() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateAgency,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: agencyKeys.all }),
  });
}
