import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { SettingsModule } from '../settings/settings.module';
import { CampaignSnapshot } from './models/campaign-snapshot.model';
import { ReportSnapshot } from './models/report-snapshot.model';
import { SnapshotBuilder } from './snapshot-builder.service';
import { SnapshotQueue } from './snapshot-queue.service';

/** Report snapshots: the builder and the queue that asks for rebuilds (no processors here). */
@Module({
  imports: [SequelizeModule.forFeature([ReportSnapshot, CampaignSnapshot]), SettingsModule],
  providers: [SnapshotBuilder, SnapshotQueue],
  // SnapshotQueue for the tally review, which asks for a rebuild after an approval.
  exports: [SnapshotBuilder, SnapshotQueue, SequelizeModule],
})
export class ReportsModule {}
