import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ExportView, Page } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { pollWhileUnderWay } from './export-polling';
import { exportKeys, type ExportListParams } from './keys';

/** The signed-in person's own exports, newest first. */
export function getExports(params: ExportListParams, signal?: AbortSignal) {
  return apiGet<Page<ExportView>>('/exports', {
    params: { page: params.page, pageSize: params.pageSize },
    signal,
  });
}

export function getExportsQueryOptions(params: ExportListParams) {
  return queryOptions({
    queryKey: exportKeys.list(params),
    queryFn: ({ signal }) => getExports(params, signal),
  });
}

/** Polls while any export on the page is queued or running, so its state moves on by itself. */
export function useExports(params: ExportListParams) {
  return useQuery({
    ...getExportsQueryOptions(params),
    refetchInterval: (query) => pollWhileUnderWay(query.state.data?.items),
  });
}
