import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { ExportQueue } from './export-queue.service';

/** In every process that runs the export processors: registers the repeating cleanup. */
@Injectable()
export class ExportCleanupSchedule implements OnApplicationBootstrap {
  private readonly logger = new Logger('ExportCleanupSchedule');

  constructor(private readonly queue: ExportQueue) {}

  onApplicationBootstrap(): void {
    // Not awaited: with Redis away the API must still start (as SnapshotBootstrap does).
    this.queue
      .scheduleCleanup()
      .catch((error: Error) =>
        this.logger.warn(`could not schedule the export cleanup: ${error.message}`),
      );
  }
}
