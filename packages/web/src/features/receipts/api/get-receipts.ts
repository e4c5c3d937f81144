import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ReceiptListParams, ReceiptPage } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

export const receiptKeys = {
  all: ['receipts'] as const,
  lists: () => [...receiptKeys.all, 'list'] as const,
  list: (params: ReceiptListParams) => [...receiptKeys.lists(), params] as const,
  details: () => [...receiptKeys.all, 'detail'] as const,
  detail: (id: number) => [...receiptKeys.details(), id] as const,
  history: (id: number) => [...receiptKeys.detail(id), 'history'] as const,
  scanFile: (id: number, scanId: number) => [...receiptKeys.detail(id), 'scan', scanId] as const,
};

/** One page of parcels, filtered, sorted and paged by the server, with totals over every match. */
export function getReceipts(params: ReceiptListParams, signal?: AbortSignal): Promise<ReceiptPage> {
  return apiGet<ReceiptPage>('/receipts', {
    params: {
      page: params.page,
      pageSize: params.pageSize,
      from: params.from,
      to: params.to,
      regionId: params.regionId,
      chapterId: params.chapterId,
      campaignId: params.campaignId,
      hasScan: params.hasScan,
      sort: params.sort,
      direction: params.direction,
    },
    signal,
  });
}

export function getReceiptsQueryOptions(params: ReceiptListParams) {
  return queryOptions({
    queryKey: receiptKeys.list(params),
    queryFn: ({ signal }) => getReceipts(params, signal),
  });
}

export function useReceipts(params: ReceiptListParams) {
  return useQuery({
    ...getReceiptsQueryOptions(params),
    // Keep the current page on screen while the next one loads, so the table does not jump.
    placeholderData: keepPreviousData,
  });
}
