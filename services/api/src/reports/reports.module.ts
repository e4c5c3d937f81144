import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { SettingsModule } from '../settings/settings.module';
import { CampaignSnapshot } from './models/campaign-snapshot.model';
import { ReportSnapshot } from './models/report-snapshot.model';
import { ChapterFigures } from './chapter-figures.service';
import { SnapshotBuilder } from './snapshot-builder.service';
import { SnapshotQueue } from './snapshot-queue.service';

/** Report snapshots: the builder and the queue that asks for rebuilds (no processors here). */
@Module({
  imports: [SequelizeModule.forFeature([ReportSnapshot, CampaignSnapshot]), SettingsModule],
  providers: [SnapshotBuilder, SnapshotQueue, ChapterFigures],
  // SnapshotQueue for the tally review, which asks for a rebuild after an approval;
  // ChapterFigures for the dashboards and the trace, which read chapters live.
  exports: [SnapshotBuilder, SnapshotQueue, ChapterFigures, SequelizeModule],
})
export class ReportsModule {}
