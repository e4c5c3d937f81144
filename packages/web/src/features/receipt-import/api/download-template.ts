import { useMutation } from '@tanstack/react-query';
import { apiGetBlob } from '@/lib/api-client';

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
  const url = URL.createObjectURL(blob);
  try {
    const link = document.createElement('a');
    link.href = url;
    link.download = fileNames[kind];
    document.body.append(link);
    link.click();
    link.remove();
  } finally {
    // Give the browser a moment to start the download before the URL goes.
    setTimeout(() => URL.revokeObjectURL(url), 1_000);
  }
}

export function useDownloadTemplate() {
  return useMutation({ mutationFn: downloadTemplate });
}
