import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FindingView } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { storeSavedFinding } from './saved-finding';

export interface RespondToFindingInput {
  id: number;
  body: string;
}

/** Adds a response on the network's behalf; responses are kept, never changed. */
export function respondToFinding({ id, body }: RespondToFindingInput): Promise<FindingView> {
  return apiPost<FindingView>(`/findings/${id}/responses`, { body });
}

export function useRespondToFinding() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: respondToFinding,
    onSuccess: (finding) => storeSavedFinding(queryClient, finding),
  });
}
