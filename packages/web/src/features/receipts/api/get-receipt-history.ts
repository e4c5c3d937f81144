import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '@/lib/api-client';
import { receiptKeys } from './get-receipts';

/**
 * One audit entry of a parcel, as `GET /receipts/:id/history` answers (the server's
 * ReceiptHistoryEntryDto). Core's contract does not carry this shape yet; when it does, this
 * type goes and the import points there.
 */
export interface ReceiptHistoryEntry {
  id: number;
  /** e.g. "receipt.created", "receipt.updated", "receipt.sender_erased". */
  action: string;
  occurredAt: string;
  actorUserId: number | null;
  actorEmail: string | null;
  /** The audited fields before and after; never the sender's details, only whether present. */
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
}

/** Who did what to a parcel, and when, oldest first. */
export function getReceiptHistory(
  id: number,
  signal?: AbortSignal,
): Promise<ReceiptHistoryEntry[]> {
  return apiGet<ReceiptHistoryEntry[]>(`/receipts/${id}/history`, { signal });
}

export function getReceiptHistoryQueryOptions(id: number) {
  return queryOptions({
    queryKey: receiptKeys.history(id),
    queryFn: ({ signal }) => getReceiptHistory(id, signal),
  });
}

export function useReceiptHistory(id: number) {
  return useQuery(getReceiptHistoryQueryOptions(id));
}
