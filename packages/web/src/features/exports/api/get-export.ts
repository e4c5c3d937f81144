import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ExportView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { pollWhileUnderWay } from './export-polling';
import { exportKeys } from './keys';

/** One export of the signed-in person: its state, progress and, once done, the download link. */
export function getExport(id: string, signal?: AbortSignal): Promise<ExportView> {
  return apiGet<ExportView>(`/exports/${encodeURIComponent(id)}`, { signal });
}

export function getExportQueryOptions(id: string) {
  return queryOptions({
    queryKey: exportKeys.detail(id),
    queryFn: ({ signal }) => getExport(id, signal),
  });
}

/** Polls every second while the export is queued or running, then stops. */
export function useExport(id: string | undefined) {
  return useQuery({
    ...getExportQueryOptions(id ?? ''),
    enabled: id !== undefined,
    refetchInterval: (query) => pollWhileUnderWay(query.state.data && [query.state.data]),
  });
}
