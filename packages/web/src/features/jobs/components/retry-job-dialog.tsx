import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { describeProblem } from '@/components/ui/error-state';
import { useRetryJob } from '../api/retry-job';

export interface FailedJobRef {
  queue: string;
  id: string;
  name: string;
}

export interface RetryJobDialogProps {
  job: FailedJobRef | null;
  onClose: () => void;
}

/** Asks before a failed job runs again: a rebuild or a reminder should not repeat by a slip. */
export function RetryJobDialog({ job, onClose }: RetryJobDialogProps) {
  const retry = useRetryJob();
  const close = () => {
    retry.reset();
    onClose();
  };
  return (
    <ConfirmDialog
      open={job !== null}
      title="Retry this job?"
      confirmLabel="Retry"
      pendingLabel="Retrying…"
      pending={retry.isPending}
      error={retry.error ? describeProblem(retry.error).message : undefined}
      onClose={close}
      onConfirm={() => {
        if (job) retry.mutate({ queue: job.queue, jobId: job.id }, { onSuccess: close });
      }}
    >
      {job
        ? `Job ${job.id} (${job.name}) in the ${job.queue} queue goes back in the queue and runs again. Jobs recompute their figures, so running one twice does no harm.`
        : null}
    </ConfirmDialog>
  );
}
