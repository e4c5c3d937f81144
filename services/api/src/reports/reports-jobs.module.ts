import { Module } from '@nestjs/common';
import { ReportsModule } from './reports.module';
import { ReportsProcessor } from './reports.processor';
import { SnapshotBootstrap } from './snapshot-bootstrap';

/** The report processors: imported only where jobs run (see jobs/processor-modules.ts). */
@Module({
  imports: [ReportsModule],
  providers: [ReportsProcessor, SnapshotBootstrap],
})
export class ReportsJobsModule {}
