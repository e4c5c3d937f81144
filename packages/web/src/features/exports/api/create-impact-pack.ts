import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ExportView, ImpactPackRequest } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { exportKeys } from './keys';

/** Asks for the impact pack workbook; the server answers 202 with the export, queued. */
export function createImpactPack(request: ImpactPackRequest): Promise<ExportView> {
  return apiPost<ExportView>('/exports/impact-pack', request);
}

export function useCreateImpactPack() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createImpactPack,
    onSuccess: (view) => {
      queryClient.setQueryData(exportKeys.detail(view.id), view);
      return queryClient.invalidateQueries({ queryKey: exportKeys.lists() });
    },
  });
}
