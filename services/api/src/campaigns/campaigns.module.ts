import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { Region } from '../regions/models/region.model';
import { CampaignsController } from './campaigns.controller';
import { CampaignsService } from './campaigns.service';
import { Campaign } from './models/campaign.model';

@Module({
  imports: [SequelizeModule.forFeature([Campaign, Region])],
  controllers: [CampaignsController],
  providers: [CampaignsService],
  // CampaignsService.findCreditable credits a parcel's label code; the model serves its includes.
  exports: [CampaignsService, SequelizeModule],
})
export class CampaignsModule {}
