import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ImportCommitResponse } from '@tallyloom/core';
import { receiptKeys } from '@/features/receipts/api/get-receipts';
import { apiPost } from '@/lib/api-client';
import { receiptImportKeys, type ImportMapping } from './preview-import';

export interface CommitImportInput {
  importId: string;
  mapping: ImportMapping;
}

/** Stores every row as one batch, or none: a 400 names the rows (`rows.<n>.<field>`). */
export function commitImport({
  importId,
  mapping,
}: CommitImportInput): Promise<ImportCommitResponse> {
  return apiPost<ImportCommitResponse>(`/receipts/imports/${encodeURIComponent(importId)}/commit`, {
    mapping,
  });
}

export function useCommitImport() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: commitImport,
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: receiptImportKeys.all });
      return queryClient.invalidateQueries({ queryKey: receiptKeys.lists() });
    },
  });
}
