import { Text, tokens, makeStyles } from '@fluentui/react-components';
import { useState } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { formatTimeOfDay } from '@/lib/format';
import { useJobs } from '../api/get-jobs';
import { QueueCard } from './queue-card';
import { RetryJobDialog, type FailedJobRef } from './retry-job-dialog';

const useStyles = makeStyles({
  checked: {
    display: 'block',
    color: tokens.colorNeutralForeground2,
    marginBottom: tokens.spacingVerticalM,
  },
});

/** The background queues, refreshed every few seconds while the page is open. */
export function JobsOverview() {
  const styles = useStyles();
  const jobs = useJobs();
  const [retrying, setRetrying] = useState<FailedJobRef | null>(null);

  if (jobs.isPending) return <LoadingState label="Loading the queues…" />;
  // A failed poll after a good one keeps the last figures on screen, with the error above them.
  if (jobs.isError && !jobs.data) {
    return (
      <ErrorState
        title="The queues could not be loaded"
        error={jobs.error}
        onRetry={() => void jobs.refetch()}
        retrying={jobs.isFetching}
      />
    );
  }
  return (
    <>
      {jobs.isError ? (
        <ErrorState title="The last refresh failed" error={jobs.error} headingLevel={2} />
      ) : null}
      <Text size={200} className={styles.checked} aria-live="off">
        Checked at {formatTimeOfDay(jobs.dataUpdatedAt)}; refreshes every 3 seconds.
      </Text>
      {jobs.data.length === 0 ? (
        <EmptyState title="No queues">
          The API has no background queues registered. Check the system status page.
        </EmptyState>
      ) : (
        jobs.data.map((queue) => <QueueCard key={queue.name} queue={queue} onRetry={setRetrying} />)
      )}
      <RetryJobDialog job={retrying} onClose={() => setRetrying(null)} />
    </>
  );
}
