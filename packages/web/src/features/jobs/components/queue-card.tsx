import {
  Button,
  Card,
  CardHeader,
  Field,
  makeStyles,
  ProgressBar,
  Text,
  tokens,
} from '@fluentui/react-components';
import { ArrowClockwise20Regular } from '@fluentui/react-icons';
import type { JobQueueView } from '@tallyloom/core';
import { FactList } from '@/components/ui/fact-list';
import { formatCount, formatDateTime } from '@/lib/format';
import type { FailedJobRef } from './retry-job-dialog';

const useStyles = makeStyles({
  card: { marginBottom: tokens.spacingVerticalL },
  counts: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalXL,
    margin: 0,
    padding: 0,
    listStyleType: 'none',
  },
  count: { fontVariantNumeric: 'tabular-nums' },
  list: {
    margin: 0,
    padding: 0,
    listStyleType: 'none',
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalM,
  },
  failure: {
    display: 'flex',
    justifyContent: 'space-between',
    alignItems: 'flex-start',
    gap: tokens.spacingHorizontalM,
    padding: tokens.spacingVerticalS,
    borderLeft: `3px solid ${tokens.colorStatusDangerBorderActive}`,
    backgroundColor: tokens.colorStatusDangerBackground1,
  },
  reason: { fontFamily: tokens.fontFamilyMonospace, overflowWrap: 'anywhere' },
  quiet: { color: tokens.colorNeutralForeground2 },
});

const COUNT_LABELS: Record<keyof JobQueueView['counts'], string> = {
  waiting: 'Waiting',
  active: 'Running',
  delayed: 'Delayed',
  failed: 'Failed',
  completed: 'Completed',
};

/** Bull reports progress as a percentage; anything outside 0–100 is clamped. */
function percentOf(progress: number): number {
  return Math.min(100, Math.max(0, Number.isFinite(progress) ? progress : 0));
}

export interface QueueCardProps {
  queue: JobQueueView;
  onRetry: (job: FailedJobRef) => void;
}

/** One queue: its counts, the jobs running now, the failures with their reason, the schedule. */
export function QueueCard({ queue, onRetry }: QueueCardProps) {
  const styles = useStyles();
  const headingId = `queue-${queue.name}`;
  return (
    <Card className={styles.card} role="region" aria-labelledby={headingId}>
      <CardHeader
        header={
          <Text as="h2" id={headingId} size={400} weight="semibold">
            {queue.name}
          </Text>
        }
      />
      <ul className={styles.counts} aria-label={`${queue.name} counts`}>
        {(Object.keys(COUNT_LABELS) as Array<keyof JobQueueView['counts']>).map((key) => (
          <li key={key}>
            <Text className={styles.quiet}>{COUNT_LABELS[key]}: </Text>
            <Text weight="semibold" className={styles.count}>
              {formatCount(queue.counts[key])}
            </Text>
          </li>
        ))}
      </ul>

      <Text as="h3" weight="semibold">
        Running
      </Text>
      {queue.active.length === 0 ? (
        <Text className={styles.quiet}>Nothing running.</Text>
      ) : (
        <ul className={styles.list}>
          {queue.active.map((job) => {
            const percent = percentOf(job.progress);
            return (
              <li key={job.id}>
                <Field
                  label={`${job.name} (job ${job.id})`}
                  hint={`${Math.round(percent)}% done${job.startedAt ? `, started ${formatDateTime(job.startedAt)}` : ''}`}
                >
                  <ProgressBar value={percent} max={100} thickness="large" />
                </Field>
              </li>
            );
          })}
        </ul>
      )}

      <Text as="h3" weight="semibold">
        Failed
      </Text>
      {queue.failed.length === 0 ? (
        <Text className={styles.quiet}>No failures.</Text>
      ) : (
        <ul className={styles.list}>
          {queue.failed.map((job) => (
            <li key={job.id} className={styles.failure}>
              <div>
                <Text weight="semibold">
                  {job.name} (job {job.id})
                </Text>
                <Text as="p" className={styles.reason}>
                  {job.failedReason}
                </Text>
                <Text size={200} className={styles.quiet}>
                  {job.attemptsMade === 1 ? '1 attempt' : `${job.attemptsMade} attempts`}, failed{' '}
                  {formatDateTime(job.failedAt, 'at an unknown time')}
                </Text>
              </div>
              <Button
                icon={<ArrowClockwise20Regular />}
                aria-label={`Retry job ${job.id} (${job.name})`}
                onClick={() => onRetry({ queue: queue.name, id: job.id, name: job.name })}
              >
                Retry
              </Button>
            </li>
          ))}
        </ul>
      )}

      {queue.repeatable.length ? (
        <>
          <Text as="h3" weight="semibold">
            Repeating
          </Text>
          <FactList
            rows={queue.repeatable.map((job) => [
              job.name,
              `${job.cron ? `${job.cron}; ` : ''}next run ${formatDateTime(job.next, 'not scheduled')}`,
            ])}
          />
        </>
      ) : null}
    </Card>
  );
}
