import { Process, Processor } from '@nestjs/bull';
import type { Job } from 'bull';
import { QueueName } from '../jobs/queue-names';
import { ReportJob, type ChapterMonthJob, type RebuildSummary } from './report-jobs';
import { SnapshotBuilder } from './snapshot-builder.service';

/** Runs the snapshot rebuilds; a thrown error fails the attempt and Bull retries with backoff. */
@Processor(QueueName.Reports)
export class ReportsProcessor {
  constructor(private readonly builder: SnapshotBuilder) {}

  @Process(ReportJob.ChapterMonth)
  chapterMonth(job: Job<ChapterMonthJob>): Promise<RebuildSummary> {
    return this.builder.rebuildForChapterMonth(job.data.chapterId, job.data.month);
  }

  @Process(ReportJob.FullRebuild)
  fullRebuild(job: Job): Promise<RebuildSummary> {
    return this.builder.rebuildAll((percent) => job.progress(percent));
  }
}
