import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AuditSampleView, WorksheetEntryRequest } from '@tallyloom/core';
import { apiPut } from '@/lib/api-client';
import { sampleKeys } from './keys';

export interface RecordItemInput {
  sampleId: number;
  itemId: number;
  entry: WorksheetEntryRequest;
  /** Optional evidence (JPEG, PNG, WebP or PDF); sent as multipart `attachment`. */
  attachment?: File;
}

export const ATTACHMENT_ACCEPT = 'image/jpeg,image/png,image/webp,application/pdf';

/** Records "agrees" or "deviation" for one sampled item; answers with the whole sample. */
export function recordItem({
  sampleId,
  itemId,
  entry,
  attachment,
}: RecordItemInput): Promise<AuditSampleView> {
  const path = `/samples/${sampleId}/items/${itemId}`;
  if (!attachment) return apiPut<AuditSampleView>(path, entry);
  const form = new FormData();
  form.append('result', entry.result);
  if (entry.note !== undefined) form.append('note', entry.note);
  form.append('attachment', attachment);
  return apiPut<AuditSampleView>(path, form);
}

export function useRecordItem() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: recordItem,
    onSuccess: (sample) => {
      queryClient.setQueryData(sampleKeys.detail(sample.id), sample);
      return queryClient.invalidateQueries({ queryKey: sampleKeys.lists() });
    },
  });
}
