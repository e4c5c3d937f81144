import { Process, Processor } from '@nestjs/bull';
import type { Job } from 'bull';
import { todayUtc } from '../tallies/tally-clock';
import { QueueName } from '../jobs/queue-names';
import { ReminderJob, type ReminderJobData, type ReminderJobResult } from './reminder-job';
import { RemindersService } from './reminders.service';

@Processor(QueueName.Reminders)
export class RemindersProcessor {
  constructor(private readonly reminders: RemindersService) {}

  @Process(ReminderJob.Daily)
  async daily(job: Job<ReminderJobData>): Promise<ReminderJobResult> {
    await job.log(`started by process ${process.pid}`);
    const result = await this.reminders.run(job.data.today ?? todayUtc(), job.data.chapterIds);
    await job.progress(100);
    return { ...result, pid: process.pid };
  }
}
