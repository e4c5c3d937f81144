import { queryOptions, useQuery } from '@tanstack/react-query';
import { useObjectUrl } from '@/hooks/use-object-url';
import { apiGetBlob } from '@/lib/api-client';
import { sampleKeys } from './keys';

/** A worksheet attachment as a Blob: it needs the sign-in header, so a plain link cannot. */
export function getAttachment(
  sampleId: number,
  itemId: number,
  signal?: AbortSignal,
): Promise<Blob> {
  return apiGetBlob(`/samples/${sampleId}/items/${itemId}/attachment`, { signal });
}

export function getAttachmentQueryOptions(sampleId: number, itemId: number) {
  return queryOptions({
    queryKey: sampleKeys.attachment(sampleId, itemId),
    queryFn: ({ signal }) => getAttachment(sampleId, itemId, signal),
  });
}

/** The attachment as an object URL, revoked when no longer shown. */
export function useAttachmentUrl(sampleId: number, itemId: number) {
  const file = useQuery(getAttachmentQueryOptions(sampleId, itemId));
  const url = useObjectUrl(file.data);
  return { url, isError: file.isError };
}
