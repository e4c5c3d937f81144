import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ScanView } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { receiptKeys } from './get-receipts';

/** What the server takes as a scan; it checks the content, this only steers the file picker. */
export const SCAN_ACCEPT = 'image/jpeg,image/png,image/webp,application/pdf';

export interface UploadScanInput {
  receiptId: number;
  file: File;
}

/** Attaches a scan or photo of the label or packing slip (multipart `file`). */
export function uploadScan({ receiptId, file }: UploadScanInput): Promise<ScanView> {
  const form = new FormData();
  form.append('file', file);
  return apiPost<ScanView>(`/receipts/${receiptId}/scans`, form);
}

export function useUploadScan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadScan,
    onSuccess: (_scan, { receiptId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: receiptKeys.detail(receiptId) }),
        queryClient.invalidateQueries({ queryKey: receiptKeys.lists() }),
      ]),
  });
}
