import { ApiProperty } from '@nestjs/swagger';
import type { JobQueueView } from '@tallyloom/core';

/** One Bull queue as the Jobs page shows it (see JobQueueView for the fields). */
export class JobQueueViewDto implements JobQueueView {
  @ApiProperty({ example: 'reminders' })
  name: string;

  @ApiProperty({ example: { waiting: 0, active: 1, completed: 120, failed: 2, delayed: 0 } })
  counts: JobQueueView['counts'];

  @ApiProperty({ description: 'Running jobs with their progress from 0 to 100' })
  active: JobQueueView['active'];

  @ApiProperty({ description: 'The latest 20 failures, newest first, with their reason' })
  failed: JobQueueView['failed'];

  @ApiProperty({ description: 'Repeatable jobs with their cron pattern and next run' })
  repeatable: JobQueueView['repeatable'];
}
