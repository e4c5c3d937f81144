import { queryOptions, useQuery } from '@tanstack/react-query';
import { useObjectUrl } from '@/hooks/use-object-url';
import { apiGetBlob } from '@/lib/api-client';
import { receiptKeys } from './get-receipts';

export interface ScanFileParams {
  receiptId: number;
  scanId: number;
}

/** A scan's file as a Blob: it needs the bearer token, so an <img src> cannot fetch it itself. */
export function getScanFile(
  { receiptId, scanId }: ScanFileParams,
  signal?: AbortSignal,
): Promise<Blob> {
  return apiGetBlob(`/receipts/${receiptId}/scans/${scanId}/file`, { signal });
}

export function getScanFileQueryOptions(params: ScanFileParams) {
  return queryOptions({
    queryKey: receiptKeys.scanFile(params.receiptId, params.scanId),
    queryFn: ({ signal }) => getScanFile(params, signal),
    // A stored scan never changes; a replaced one gets a new id.
    staleTime: Infinity,
  });
}

/** The scan as an object URL for <img> or a link, revoked when no longer shown. */
export function useScanFileUrl(params: ScanFileParams) {
  const file = useQuery(getScanFileQueryOptions(params));
  const url = useObjectUrl(file.data);
  return { url, isPending: file.isPending, isError: file.isError, error: file.error };
}
