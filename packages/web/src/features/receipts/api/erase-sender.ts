import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ParcelReceiptDetail } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { receiptKeys } from './get-receipts';

/** Clears the sender's name, e-mail and address for good; every count stays. */
export function eraseSender(id: number): Promise<ParcelReceiptDetail> {
  return apiPost<ParcelReceiptDetail>(`/receipts/${id}/erase-sender`);
}

export function useEraseSender() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: eraseSender,
    onSuccess: (receipt) => {
      queryClient.setQueryData(receiptKeys.detail(receipt.id), receipt);
      return queryClient.invalidateQueries({ queryKey: receiptKeys.all });
    },
  });
}
