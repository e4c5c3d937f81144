import { Module } from '@nestjs/common';
import { JobsAdminController } from './jobs-admin.controller';
import { JobsAdminService } from './jobs-admin.service';

/** The Jobs page's API; the queues themselves come from the global JobsModule. */
@Module({
  controllers: [JobsAdminController],
  providers: [JobsAdminService],
})
export class JobsAdminModule {}
