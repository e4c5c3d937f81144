import type { Type } from '@nestjs/common';
import { AuditJobsModule } from '../audit/audit-jobs.module';
import { ExportsJobsModule } from '../exports/exports-jobs.module';
import { RemindersJobsModule } from '../reminders/reminders-jobs.module';
import { ReportsJobsModule } from '../reports/reports-jobs.module';

/**
 * Every module that holds a Bull processor, in one list: the API imports them unless
 * JOB_PROCESSORS=off, and `npm run worker` always does. Producers live in the feature modules,
 * so enqueuing works in every process.
 */
export const PROCESSOR_MODULES: Type[] = [
  ReportsJobsModule,
  RemindersJobsModule,
  ExportsJobsModule,
  AuditJobsModule,
];
