import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AuditSampleView, DrawSampleRequest } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { sampleKeys } from './keys';

/** Draws and stores a sample; the server picks a fresh seed unless one is given. */
export function drawSample(request: DrawSampleRequest): Promise<AuditSampleView> {
  return apiPost<AuditSampleView>('/samples', request);
}

export function useDrawSample() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: drawSample,
    onSuccess: (sample) => {
      queryClient.setQueryData(sampleKeys.detail(sample.id), sample);
      return queryClient.invalidateQueries({ queryKey: sampleKeys.lists() });
    },
  });
}
