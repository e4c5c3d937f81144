import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SubmitTallyRequest, TallyDetail } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { refreshAfterTallyWrite } from './invalidate-tally';

export interface SubmitTallyInput extends SubmitTallyRequest {
  id: number;
  /** The same key sent again answers as the first submission did: one submission, not two. */
  idempotencyKey?: string;
}

export function newIdempotencyKey(): string {
  return crypto.randomUUID();
}

/** Sends the tally for review, with the warnings acknowledged and the note. */
export function submitTally({
  id,
  idempotencyKey = newIdempotencyKey(),
  ...request
}: SubmitTallyInput): Promise<TallyDetail> {
  return apiPost<TallyDetail>(`/tallies/${id}/submit`, request satisfies SubmitTallyRequest, {
    headers: { 'Idempotency-Key': idempotencyKey },
  });
}

export function useSubmitTally() {
  const queryClient = useQueryClient();
  return useMutation({
    // The key is fixed here, before the request, so it is the same however often it is sent.
    mutationFn: (input: SubmitTallyInput) =>
      submitTally({ ...input, idempotencyKey: input.idempotencyKey ?? newIdempotencyKey() }),
    onSuccess: (tally) => refreshAfterTallyWrite(queryClient, tally),
  });
}
