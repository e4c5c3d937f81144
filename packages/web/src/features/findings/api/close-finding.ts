import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FindingView } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { findingKeys } from './keys';
import { conflictingFinding, storeSavedFinding } from './saved-finding';

export interface CloseFindingInput {
  id: number;
  version: number;
}

/** Closes a finding for good: no more edits or responses. */
export function closeFinding({ id, version }: CloseFindingInput): Promise<FindingView> {
  return apiPost<FindingView>(`/findings/${id}/close`, { version });
}

export function useCloseFinding() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: closeFinding,
    onSuccess: (finding) => storeSavedFinding(queryClient, finding),
    onError: (error, { id }) => {
      const current = conflictingFinding(error);
      if (current) queryClient.setQueryData(findingKeys.detail(id), current);
    },
  });
}
