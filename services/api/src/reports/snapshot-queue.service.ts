import { InjectQueue } from '@nestjs/bull';
import { Injectable, Logger } from '@nestjs/common';
import type { Job, Queue } from 'bull';
import { QueueName } from '../jobs/queue-names';
import {
  NIGHTLY_FULL_REBUILD,
  REPORT_JOB_OPTIONS,
  ReportJob,
  type ChapterMonthJob,
} from './report-jobs';

/** Puts snapshot rebuilds on the reports queue; any process may enqueue, workers run them. */
@Injectable()
export class SnapshotQueue {
  private readonly logger = new Logger('SnapshotQueue');

  constructor(@InjectQueue(QueueName.Reports) private readonly queue: Queue) {}

  chapterMonth(data: ChapterMonthJob): Promise<Job> {
    return this.queue.add(ReportJob.ChapterMonth, data, REPORT_JOB_OPTIONS);
  }

  fullRebuild(jobId?: string): Promise<Job> {
    return this.queue.add(ReportJob.FullRebuild, {}, { ...REPORT_JOB_OPTIONS, jobId });
  }

  /**
   * After a tally's submission, return or approval has committed (figures, pending counts and
   * compliance may change). Never awaited by the caller and never throws: the change stands even
   * when Redis is away, and the nightly full rebuild repairs the snapshots.
   */
  afterTallyChange(data: ChapterMonthJob): void {
    this.chapterMonth(data).catch((error: Error) =>
      this.logger.warn(
        `could not enqueue the snapshot rebuild of chapter ${data.chapterId} ${data.month}: ${error.message}`,
      ),
    );
  }

  /** Bull keys repeatable jobs by name and cron, so every process may register it. */
  async scheduleNightlyRebuild(): Promise<void> {
    await this.queue.add(
      ReportJob.FullRebuild,
      {},
      {
        ...REPORT_JOB_OPTIONS,
        repeat: { cron: NIGHTLY_FULL_REBUILD.cron },
        jobId: NIGHTLY_FULL_REBUILD.jobId,
      },
    );
  }
}
