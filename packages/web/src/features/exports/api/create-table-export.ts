import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ExportView, TableExportRequest } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { exportKeys } from './keys';

/** Asks for a table export; the server answers 202 with the export, queued. */
export function createTableExport(request: TableExportRequest): Promise<ExportView> {
  return apiPost<ExportView>('/exports', request);
}

export function useCreateTableExport() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTableExport,
    onSuccess: (view) => {
      // The dialog starts from the answer instead of waiting a poll for the first state.
      queryClient.setQueryData(exportKeys.detail(view.id), view);
      return queryClient.invalidateQueries({ queryKey: exportKeys.lists() });
    },
  });
}
