import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '@/lib/api-client';
import { jobKeys } from './get-jobs';

export interface RetryJobInput {
  queue: string;
  jobId: string;
}

/** Puts a failed job back in its queue. */
export function retryJob({ queue, jobId }: RetryJobInput): Promise<unknown> {
  return apiPost<unknown>(`/jobs/${encodeURIComponent(queue)}/${encodeURIComponent(jobId)}/retry`);
}

export function useRetryJob() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retryJob,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobKeys.all }),
  });
}
