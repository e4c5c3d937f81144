import { useMutation } from '@tanstack/react-query';
import { apiGetBlob } from '@/lib/api-client';
import { saveBlob } from '@/lib/save-blob';

export type TemplateKind = 'csv' | 'xlsx';

const fileNames: Record<TemplateKind, string> = {
  csv: 'parcel-receipts-template.csv',
  xlsx: 'parcel-receipts-template.xlsx',
};

/**
 * Fetches a template with the bearer token (a plain link cannot send it) and hands it to the
 * browser as a download.
 */
export async function downloadTemplate(kind: TemplateKind): Promise<void> {
  const blob = await apiGetBlob(`/receipts/imports/template.${kind}`);
  saveBlob(blob, fileNames[kind]);
}

export function useDownloadTemplate() {
  return useMutation({ mutationFn: downloadTemplate });
}
