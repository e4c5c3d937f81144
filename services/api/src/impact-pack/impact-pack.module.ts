import { Module } from '@nestjs/common';
import { DashboardsModule } from '../dashboards/dashboards.module';
import { SettingsModule } from '../settings/settings.module';
import { ImpactPackDataService } from './impact-pack-data.service';
import { ImpactPackProducer } from './impact-pack.producer';

/** The impact pack workbook; the exports job runs ImpactPackProducer for 'impact-pack' exports. */
@Module({
  imports: [DashboardsModule, SettingsModule],
  providers: [ImpactPackDataService, ImpactPackProducer],
  exports: [ImpactPackProducer],
})
export class ImpactPackModule {}
