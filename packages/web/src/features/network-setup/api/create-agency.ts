import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PartnerAgencyView, SavePartnerAgencyRequest } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { agencyKeys } from './get-agencies';

/** Adds a partner agency served by one or more chapters; the name is unique (409). */
export function createAgency(request: SavePartnerAgencyRequest): Promise<PartnerAgencyView> {
  return apiPost<PartnerAgencyView>('/agencies', request);
}

export function useCreateAgency() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createAgency,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: agencyKeys.all }),
  });
}
