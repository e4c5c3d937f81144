import { InjectQueue } from '@nestjs/bull';
import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import type { Queue } from 'bull';
import { QueueName } from '../jobs/queue-names';
import { ReminderJob, type ReminderJobData } from './reminder-job';

export const DAILY_REMINDERS_CRON = '0 7 * * *';
export const DAILY_REMINDERS_JOB_ID = 'daily-tally-reminders';

/** What every reminder job gets: retried with growing pauses when a mail server is down. */
export const REMINDER_JOB_OPTIONS = {
  attempts: 5,
  backoff: { type: 'exponential', delay: 60_000 },
  removeOnComplete: 500,
  removeOnFail: 500,
} as const;

/**
 * Puts the daily reminder run on the queue. Every process does it at start; Bull keys a
 * repeatable job by name, id and cron, so the schedule exists once however many start.
 */
@Injectable()
export class RemindersScheduler implements OnApplicationBootstrap {
  private readonly logger = new Logger('Reminders');

  constructor(@InjectQueue(QueueName.Reminders) private readonly queue: Queue<ReminderJobData>) {}

  onApplicationBootstrap(): void {
    // Not awaited: with Redis away, Bull waits for it, and the API must start rather than hang.
    void this.schedule();
  }

  private async schedule(): Promise<void> {
    try {
      await this.queue.add(
        ReminderJob.Daily,
        {},
        {
          ...REMINDER_JOB_OPTIONS,
          jobId: DAILY_REMINDERS_JOB_ID,
          // UTC, like the due dates the job compares against.
          repeat: { cron: DAILY_REMINDERS_CRON, tz: 'UTC' },
        },
      );
    } catch (error) {
      // Redis being away must not stop the API; the next start schedules it.
      this.logger.warn(`could not schedule the daily reminders: ${(error as Error).message}`);
    }
  }
}
