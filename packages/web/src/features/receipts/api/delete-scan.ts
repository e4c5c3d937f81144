import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiDelete } from '@/lib/api-client';
import { receiptKeys } from './get-receipts';

export interface DeleteScanInput {
  receiptId: number;
  scanId: number;
}

/** Removes a scan from a parcel; answers 204. */
export function deleteScan({ receiptId, scanId }: DeleteScanInput): Promise<void> {
  return apiDelete<void>(`/receipts/${receiptId}/scans/${scanId}`);
}

export function useDeleteScan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteScan,
    onSuccess: (_nothing, { receiptId, scanId }) => {
      queryClient.removeQueries({ queryKey: receiptKeys.scanFile(receiptId, scanId) });
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: receiptKeys.detail(receiptId) }),
        queryClient.invalidateQueries({ queryKey: receiptKeys.lists() }),
      ]);
    },
  });
}
