import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReturnTallyRequest, TallyDetail } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { refreshAfterTallyWrite } from './invalidate-tally';

export interface ReturnTallyInput extends ReturnTallyRequest {
  id: number;
}

/** Sends a submitted tally back to the chapter with a comment saying what to fix. */
export function returnTally({ id, ...request }: ReturnTallyInput): Promise<TallyDetail> {
  return apiPost<TallyDetail>(`/tallies/${id}/return`, request satisfies ReturnTallyRequest);
}

export function useReturnTally() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: returnTally,
    onSuccess: (tally) => refreshAfterTallyWrite(queryClient, tally),
  });
}
