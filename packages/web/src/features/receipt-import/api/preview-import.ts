import { useQuery } from '@tanstack/react-query';
import type {
  ImportPreviewResponse,
  ImportPreviewRow,
  ImportUploadResponse,
  ReceiptImportField,
} from '@tallyloom/core';
import { useState } from 'react';
import { apiPost } from '@/lib/api-client';

export type ImportMapping = Record<string, ReceiptImportField | null>;

/** The most rows one preview call returns (the server's limit). */
export const PREVIEW_PAGE_SIZE = 500;

export const receiptImportKeys = {
  all: ['receipt-imports'] as const,
  preview: (importId: string, mapping: ImportMapping) =>
    [...receiptImportKeys.all, importId, 'preview', mapping] as const,
};

/** Every row of the preview, with the counts of the first answer (they cover every row). */
export interface FullPreview {
  counts: Pick<ImportPreviewResponse, 'rowCount' | 'validCount' | 'errorCount' | 'warningCount'>;
  rows: ImportPreviewRow[];
}

export function previewImportPage(
  importId: string,
  mapping: ImportMapping,
  page: number,
  signal?: AbortSignal,
): Promise<ImportPreviewResponse> {
  return apiPost<ImportPreviewResponse>(
    `/receipts/imports/${encodeURIComponent(importId)}/preview`,
    { mapping, page, pageSize: PREVIEW_PAGE_SIZE, only: 'all' },
    { signal },
  );
}

/**
 * Checks every row with this mapping, a page at a time, reporting how many rows have been
 * checked so far. Nothing is stored.
 */
export async function previewAllRows(
  importId: string,
  mapping: ImportMapping,
  onProgress: (checked: number) => void,
  signal?: AbortSignal,
): Promise<FullPreview> {
  const first = await previewImportPage(importId, mapping, 1, signal);
  const rows = [...first.rows];
  onProgress(rows.length);
  const pages = Math.ceil(first.total / PREVIEW_PAGE_SIZE);
  for (let page = 2; page <= pages; page += 1) {
    const next = await previewImportPage(importId, mapping, page, signal);
    rows.push(...next.rows);
    onProgress(rows.length);
  }
  const { rowCount, validCount, errorCount, warningCount } = first;
  return { counts: { rowCount, validCount, errorCount, warningCount }, rows };
}

/** The whole preview of an upload with a mapping, and how far the check has got. */
export function usePreviewImport(upload: ImportUploadResponse, mapping: ImportMapping) {
  const [checked, setChecked] = useState(0);
  const query = useQuery({
    queryKey: receiptImportKeys.preview(upload.importId, mapping),
    queryFn: ({ signal }) => {
      setChecked(0);
      return previewAllRows(upload.importId, mapping, setChecked, signal);
    },
    // The upload expires; a check is redone on request, not behind the person's back.
    staleTime: Infinity,
    refetchOnWindowFocus: false,
  });
  return { ...query, checked };
}
