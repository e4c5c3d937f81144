import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { Chapter } from '../chapters/models/chapter.model';
import { SettingsModule } from '../settings/settings.module';
import { MonthlyTally } from '../tallies/models/monthly-tally.model';
import { User } from '../users/models/user.model';
import { TallyReminder } from './models/tally-reminder.model';
import { RemindersScheduler } from './reminders.scheduler';
import { RemindersService } from './reminders.service';

/** Tally reminders: the daily schedule (every process) and the sending service. */
@Module({
  imports: [
    SequelizeModule.forFeature([Chapter, MonthlyTally, User, TallyReminder]),
    SettingsModule,
  ],
  providers: [RemindersService, RemindersScheduler],
  exports: [RemindersService],
})
export class RemindersModule {}
