import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateFindingRequest, FindingView } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { storeSavedFinding } from './saved-finding';

export function createFinding(request: CreateFindingRequest): Promise<FindingView> {
  return apiPost<FindingView>('/findings', request);
}

export function useCreateFinding() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createFinding,
    onSuccess: (finding) => storeSavedFinding(queryClient, finding),
  });
}
