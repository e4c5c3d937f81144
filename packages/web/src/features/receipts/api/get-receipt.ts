import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ParcelReceiptDetail } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { receiptKeys } from './get-receipts';

/** One parcel with its scans; the sender only for the roles that may see it. */
export function getReceipt(id: number, signal?: AbortSignal): Promise<ParcelReceiptDetail> {
  return apiGet<ParcelReceiptDetail>(`/receipts/${id}`, { signal });
}

export function getReceiptQueryOptions(id: number) {
  return queryOptions({
    queryKey: receiptKeys.detail(id),
    queryFn: ({ signal }) => getReceipt(id, signal),
  });
}

export function useReceipt(id: number) {
  return useQuery(getReceiptQueryOptions(id));
}
