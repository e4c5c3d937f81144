import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { Setting } from './models/setting.model';
import { VolunteerHourValue } from './models/volunteer-hour-value.model';
import { SettingsController } from './settings.controller';
import { SettingsService } from './settings.service';
import { VolunteerHourValuesController } from './volunteer-hour-values.controller';
import { VolunteerHourValuesService } from './volunteer-hour-values.service';

@Module({
  imports: [SequelizeModule.forFeature([Setting, VolunteerHourValue])],
  controllers: [SettingsController, VolunteerHourValuesController],
  providers: [SettingsService, VolunteerHourValuesService],
  // SettingsService.current() for features that follow a setting (panel tolerance, count ceiling).
  exports: [SettingsService],
})
export class SettingsModule {}
