import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FindingView, UpdateFindingRequest } from '@tallyloom/core';
import { apiPatch } from '@/lib/api-client';
import { conflictingFinding, storeSavedFinding } from './saved-finding';
import { findingKeys } from './keys';

export interface UpdateFindingInput {
  id: number;
  /** The version read (in `changes.version`); the server refuses a stale one with 409. */
  changes: UpdateFindingRequest;
}

/** The author's edit: text, severity, and links added. */
export function updateFinding({ id, changes }: UpdateFindingInput): Promise<FindingView> {
  return apiPatch<FindingView>(`/findings/${id}`, changes);
}

export function useUpdateFinding() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateFinding,
    onSuccess: (finding) => storeSavedFinding(queryClient, finding),
    // A stale edit brings the finding as it is now: show that rather than the old text.
    onError: (error, { id }) => {
      const current = conflictingFinding(error);
      if (current) queryClient.setQueryData(findingKeys.detail(id), current);
    },
  });
}
