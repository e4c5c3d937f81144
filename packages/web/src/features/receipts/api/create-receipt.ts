import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ParcelReceiptDetail, ParcelReceiptInput } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { receiptKeys } from './get-receipts';

/** Logs a parcel (201); the answer's `warnings` say what is worth a second look. */
export function createReceipt(input: ParcelReceiptInput): Promise<ParcelReceiptDetail> {
  return apiPost<ParcelReceiptDetail>('/receipts', input);
}

export function useCreateReceipt() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createReceipt,
    onSuccess: (receipt) => {
      queryClient.setQueryData(receiptKeys.detail(receipt.id), receipt);
      return queryClient.invalidateQueries({ queryKey: receiptKeys.lists() });
    },
  });
}
