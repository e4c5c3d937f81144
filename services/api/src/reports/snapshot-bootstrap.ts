import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { ReportSnapshot } from './models/report-snapshot.model';
import { SnapshotQueue } from './snapshot-queue.service';

/**
 * In every process that runs the report processors: registers the nightly full rebuild, and
 * asks for one full rebuild when no snapshot exists yet (a fresh demo database).
 */
@Injectable()
export class SnapshotBootstrap implements OnApplicationBootstrap {
  private readonly logger = new Logger('SnapshotBootstrap');

  constructor(
    @InjectModel(ReportSnapshot) private readonly snapshots: typeof ReportSnapshot,
    private readonly queue: SnapshotQueue,
  ) {}

  onApplicationBootstrap(): void {
    // Not awaited: with Redis away, Bull waits for it, and the API must start (health says
    // "degraded") rather than hang.
    void this.schedule();
  }

  private async schedule(): Promise<void> {
    try {
      await this.queue.scheduleNightlyRebuild();
      if ((await this.snapshots.count()) === 0) {
        // One id, so several workers starting together queue one rebuild, not one each.
        await this.queue.fullRebuild('initial-full-rebuild');
      }
    } catch (error) {
      // Start anyway: the API serves what snapshots exist, and the schedule is set next start.
      this.logger.warn(`could not schedule the snapshot rebuilds: ${(error as Error).message}`);
    }
  }
}
