import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ParcelReceiptDetail, ParcelReceiptInput } from '@tallyloom/core';
import { ApiError, apiPatch } from '@/lib/api-client';
import { receiptKeys } from './get-receipts';

export interface UpdateReceiptInput {
  id: number;
  /** The version the person read; the server refuses a change based on an older one (409). */
  version: number;
  changes: ParcelReceiptInput;
}

/** Corrects a parcel. */
export function updateReceipt({
  id,
  version,
  changes,
}: UpdateReceiptInput): Promise<ParcelReceiptDetail> {
  return apiPatch<ParcelReceiptDetail>(`/receipts/${id}`, { ...changes, version });
}

/** The parcel as it is now, when a correction was refused because someone else changed it. */
export function conflictingReceipt(error: unknown): ParcelReceiptDetail | undefined {
  if (!(error instanceof ApiError) || error.statusCode !== 409) return undefined;
  const { current } = error.body as { current?: ParcelReceiptDetail };
  return current && typeof current.version === 'number' ? current : undefined;
}

export function useUpdateReceipt() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateReceipt,
    onSuccess: (receipt) => {
      queryClient.setQueryData(receiptKeys.detail(receipt.id), receipt);
      return queryClient.invalidateQueries({ queryKey: receiptKeys.all });
    },
  });
}
