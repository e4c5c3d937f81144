import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SaveTallyRequest, TallyConflictBody, TallyDetail } from '@tallyloom/core';
import { ApiError, apiPut } from '@/lib/api-client';
import { refreshAfterTallyWrite } from './invalidate-tally';

export interface SaveTallyInput extends SaveTallyRequest {
  id: number;
}

/** Stores the draft's values; `version` is the one last read (a stale one gets 409). */
export function saveTally({ id, version, values }: SaveTallyInput): Promise<TallyDetail> {
  return apiPut<TallyDetail>(`/tallies/${id}`, { version, values } satisfies SaveTallyRequest);
}

/** The tally as it is now, when a write was refused because someone else changed it first. */
export function conflictingTally(error: unknown): TallyDetail | undefined {
  if (!(error instanceof ApiError) || error.statusCode !== 409) return undefined;
  const { current } = error.body as Partial<TallyConflictBody>;
  return current && typeof current.version === 'number' ? current : undefined;
}

export function useSaveTally() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveTally,
    onSuccess: (tally) => refreshAfterTallyWrite(queryClient, tally),
  });
}
