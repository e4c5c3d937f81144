import { Process, Processor } from '@nestjs/bull';
import type { Job } from 'bull';
import { QueueName } from '../jobs/queue-names';
import { ExportCleanup } from './export-cleanup.service';
import { ExportJob, type WriteExportJob } from './export-jobs';
import { ExportFailure, ExportRunner } from './export-runner.service';

/** Writes exports and removes expired ones; a thrown error fails the attempt and Bull retries. */
@Processor(QueueName.Exports)
export class ExportsProcessor {
  constructor(
    private readonly runner: ExportRunner,
    private readonly cleanup: ExportCleanup,
  ) {}

  @Process(ExportJob.Write)
  async write(job: Job<WriteExportJob>): Promise<{ rows: number; sheets: number } | null> {
    try {
      return await this.runner.run(job.data.exportId);
    } catch (error) {
      // A failure meant for the person is final; anything else is retried until the last attempt.
      const last =
        error instanceof ExportFailure || job.attemptsMade + 1 >= (job.opts.attempts ?? 1);
      if (last) {
        await this.runner.fail(job.data.exportId, error);
        if (error instanceof ExportFailure) return null;
      }
      throw error;
    }
  }

  @Process(ExportJob.Cleanup)
  removeExpired(): Promise<{ removed: number }> {
    return this.cleanup.removeExpired();
  }
}
