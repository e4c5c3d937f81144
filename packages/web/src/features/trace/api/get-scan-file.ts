import { queryOptions, useQuery } from '@tanstack/react-query';
import { useObjectUrl } from '@/hooks/use-object-url';
import { apiGetBlob } from '@/lib/api-client';
import { traceKeys } from './keys';

/** A receipt's scan as a Blob: the download needs the bearer token, so a plain link cannot. */
export function getTraceScanFile(
  receiptId: number,
  scanId: number,
  signal?: AbortSignal,
): Promise<Blob> {
  return apiGetBlob(`/receipts/${receiptId}/scans/${scanId}/file`, { signal });
}

export function getTraceScanFileQueryOptions(receiptId: number, scanId: number) {
  return queryOptions({
    queryKey: traceKeys.scanFile(receiptId, scanId),
    queryFn: ({ signal }) => getTraceScanFile(receiptId, scanId, signal),
    // A stored scan never changes; a replaced one gets a new id.
    staleTime: Infinity,
  });
}

/** The scan as an object URL for a link, revoked when the link is no longer shown. */
export function useTraceScanUrl(receiptId: number, scanId: number) {
  const file = useQuery(getTraceScanFileQueryOptions(receiptId, scanId));
  const url = useObjectUrl(file.data);
  return { url, isError: file.isError };
}
