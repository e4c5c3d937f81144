import { useMutation } from '@tanstack/react-query';
import type { ImportUploadResponse } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';

/** What the file picker offers; the server reads the content and says if it is not a sheet. */
export const IMPORT_ACCEPT =
  '.csv,.xlsx,text/csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

export interface UploadImportInput {
  chapterId: number;
  file: File;
}

/**
 * Sends the sheet (multipart `file` and `chapterId`). The server reads it and holds it for 30
 * minutes; 409 when the same file was imported before, 400 when it cannot be read, 413 too large.
 */
export function uploadImport({
  chapterId,
  file,
}: UploadImportInput): Promise<ImportUploadResponse> {
  const form = new FormData();
  form.append('chapterId', String(chapterId));
  form.append('file', file);
  return apiPost<ImportUploadResponse>('/receipts/imports', form);
}

export function useUploadImport() {
  return useMutation({ mutationFn: uploadImport });
}
