import { Module } from '@nestjs/common';
import { RemindersProcessor } from './reminders.processor';
import { RemindersModule } from './reminders.module';

/** The reminder processor; listed in jobs/processor-modules.ts. */
@Module({
  imports: [RemindersModule],
  providers: [RemindersProcessor],
})
export class RemindersJobsModule {}
