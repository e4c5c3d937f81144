import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { Chapter } from '../chapters/models/chapter.model';
import { AgenciesController } from './agencies.controller';
import { AgenciesService } from './agencies.service';
import { AgencyChapter } from './models/agency-chapter.model';
import { PartnerAgency } from './models/partner-agency.model';

@Module({
  imports: [SequelizeModule.forFeature([PartnerAgency, AgencyChapter, Chapter])],
  controllers: [AgenciesController],
  providers: [AgenciesService],
  // The partner agency model, for features that record blankets given to an agency.
  exports: [SequelizeModule],
})
export class AgenciesModule {}
