import { Controller, Get, HttpCode, HttpStatus, Param, Post } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiConflictResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import type { JobQueueView } from '@tallyloom/core';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { JobQueueViewDto } from './dto/job-queue-view.dto';
import { JobsAdminService } from './jobs-admin.service';

@ApiTags('jobs')
@ApiBearerAuth()
@Controller('jobs')
export class JobsAdminController {
  constructor(private readonly jobs: JobsAdminService) {}

  @Get()
  @Allow('jobs.manage')
  @ApiOkResponse({ type: [JobQueueViewDto], description: 'Every queue with its jobs' })
  list(): Promise<JobQueueView[]> {
    return this.jobs.list();
  }

  @Post(':queue/:jobId/retry')
  @HttpCode(HttpStatus.OK)
  @Allow('jobs.manage')
  @ApiOkResponse({ type: JobQueueViewDto, description: 'Queued again; the queue as it is now' })
  @ApiNotFoundResponse({ description: 'No such queue or job' })
  @ApiConflictResponse({ description: 'The job has not failed' })
  retry(
    @Param('queue') queue: string,
    @Param('jobId') jobId: string,
    @Ctx() context: SignedInContext,
  ): Promise<JobQueueView> {
    return this.jobs.retry(context, queue, jobId);
  }
}
