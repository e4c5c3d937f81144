import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { Campaign } from '../campaigns/models/campaign.model';
import { Chapter } from '../chapters/models/chapter.model';
import { DashboardsModule } from '../dashboards/dashboards.module';
import { Region } from '../regions/models/region.model';
import { SettingsModule } from '../settings/settings.module';
import { StorageModule } from '../storage/storage.module';
import { ExportQueue } from './export-queue.service';
import { ExportsController } from './exports.controller';
import { ExportsService } from './exports.service';
import { ExportRecord } from './models/export-record.model';

/** Export requests and downloads; the files are written by ExportsJobsModule's processor. */
@Module({
  imports: [
    SequelizeModule.forFeature([ExportRecord, Region, Chapter, Campaign]),
    SettingsModule,
    StorageModule,
    // A snapshots export is checked against the dashboard it copies before it is queued.
    DashboardsModule,
  ],
  controllers: [ExportsController],
  providers: [ExportsService, ExportQueue],
  exports: [ExportQueue, SequelizeModule],
})
export class ExportsModule {}
