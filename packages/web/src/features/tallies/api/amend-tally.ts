import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AmendTallyRequest, TallyDetail } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { refreshAfterTallyWrite } from './invalidate-tally';

export interface AmendTallyInput extends AmendTallyRequest {
  id: number;
}

/** Opens a new revision of an approved tally, with the reason; the approved one stays in force. */
export function amendTally({ id, ...request }: AmendTallyInput): Promise<TallyDetail> {
  return apiPost<TallyDetail>(`/tallies/${id}/amend`, request satisfies AmendTallyRequest);
}

export function useAmendTally() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: amendTally,
    onSuccess: (tally) => refreshAfterTallyWrite(queryClient, tally),
  });
}
