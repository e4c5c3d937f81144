import type { JobQueueView } from '@tallyloom/core';
import type { Job, JobCounts, JobInformation } from 'bull';

const isoOrNull = (ms: number | null | undefined): string | null =>
  typeof ms === 'number' && Number.isFinite(ms) ? new Date(ms).toISOString() : null;

/** Bull reports progress as whatever a processor set; the page shows a number from 0 to 100. */
export function progressOf(value: unknown): number {
  const number = typeof value === 'number' ? value : Number.NaN;
  return Number.isFinite(number) ? Math.min(100, Math.max(0, number)) : 0;
}

/** The plain view of a queue's state, so no Bull object reaches the client. */
export function toJobQueueView(
  name: string,
  counts: JobCounts,
  active: Job[],
  failed: Job[],
  repeatable: JobInformation[],
): JobQueueView {
  return {
    name,
    counts: {
      waiting: counts.waiting,
      active: counts.active,
      completed: counts.completed,
      failed: counts.failed,
      delayed: counts.delayed,
    },
    active: active.map((job) => ({
      id: String(job.id),
      name: job.name,
      progress: progressOf(job.progress()),
      startedAt: isoOrNull(job.processedOn),
    })),
    failed: failed.map((job) => ({
      id: String(job.id),
      name: job.name,
      failedReason: job.failedReason ?? '',
      attemptsMade: job.attemptsMade,
      failedAt: isoOrNull(job.finishedOn),
    })),
    repeatable: repeatable.map((entry) => ({
      name: entry.name,
      cron: entry.cron ?? null,
      next: isoOrNull(entry.next),
    })),
  };
}
