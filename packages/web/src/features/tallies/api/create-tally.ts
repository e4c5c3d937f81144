import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateTallyRequest, TallyDetail } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { refreshAfterTallyWrite } from './invalidate-tally';

/** Starts a chapter-month's tally as a draft, prefilled from receipts and last month's closing. */
export function createTally(request: CreateTallyRequest): Promise<TallyDetail> {
  return apiPost<TallyDetail>('/tallies', request);
}

export function useCreateTally() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTally,
    onSuccess: (tally) => refreshAfterTallyWrite(queryClient, tally),
  });
}
