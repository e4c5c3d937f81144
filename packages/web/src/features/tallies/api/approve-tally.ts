import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ApproveTallyRequest, TallyDetail } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { refreshAfterTallyWrite } from './invalidate-tally';

export interface ApproveTallyInput extends ApproveTallyRequest {
  id: number;
}

/** Approves a submitted tally; reports read it from then on. */
export function approveTally({ id, ...request }: ApproveTallyInput): Promise<TallyDetail> {
  return apiPost<TallyDetail>(`/tallies/${id}/approve`, request satisfies ApproveTallyRequest);
}

export function useApproveTally() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: approveTally,
    onSuccess: (tally) => refreshAfterTallyWrite(queryClient, tally),
  });
}
