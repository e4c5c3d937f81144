import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { Chapter } from '../chapters/models/chapter.model';
import { Region } from '../regions/models/region.model';
import { ReportsModule } from '../reports/reports.module';
import { SettingsModule } from '../settings/settings.module';
import { CampaignDashboardsController } from './campaign-dashboards.controller';
import { CampaignProgressService } from './campaign-progress.service';
import { DashboardsController } from './dashboards.controller';
import { DashboardsService } from './dashboards.service';
import { PublicCampaignsController } from './public-campaigns.controller';
import { SnapshotReader } from './snapshot-reader';

/** Dashboards and campaign progress: the read side of report snapshots. */
@Module({
  imports: [SequelizeModule.forFeature([Region, Chapter]), SettingsModule, ReportsModule],
  controllers: [DashboardsController, CampaignDashboardsController, PublicCampaignsController],
  providers: [DashboardsService, CampaignProgressService, SnapshotReader],
  // The impact pack lays out the very figures the dashboards show, read the same way.
  exports: [DashboardsService, CampaignProgressService],
})
export class DashboardsModule {}
