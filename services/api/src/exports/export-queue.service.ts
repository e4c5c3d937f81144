import { InjectQueue } from '@nestjs/bull';
import { Injectable } from '@nestjs/common';
import type { Job, Queue } from 'bull';
import { QueueName } from '../jobs/queue-names';
import { EXPORT_CLEANUP, EXPORT_JOB_OPTIONS, ExportJob, type WriteExportJob } from './export-jobs';

/** Puts exports on their queue; any process may enqueue, processors run them. */
@Injectable()
export class ExportQueue {
  constructor(@InjectQueue(QueueName.Exports) private readonly queue: Queue) {}

  /** The job id is the export's id, so a repeated enqueue of one export is one job. */
  write(exportId: string): Promise<Job<WriteExportJob>> {
    const data: WriteExportJob = { exportId };
    return (this.queue as Queue<WriteExportJob>).add(ExportJob.Write, data, {
      ...EXPORT_JOB_OPTIONS,
      jobId: exportId,
    });
  }

  /** Bull keys repeatable jobs by name and interval, so every process may register it. */
  async scheduleCleanup(): Promise<void> {
    await this.queue.add(
      ExportJob.Cleanup,
      {},
      {
        ...EXPORT_JOB_OPTIONS,
        repeat: { every: EXPORT_CLEANUP.every },
        jobId: EXPORT_CLEANUP.jobId,
      },
    );
  }
}
