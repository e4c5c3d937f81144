import { getQueueToken } from '@nestjs/bull';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';
import { InjectConnection } from '@nestjs/sequelize';
import type { JobQueueView } from '@tallyloom/core';
import type { Queue } from 'bull';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import type { SignedInContext } from '../common/context/request-context';
import { toJobQueueView } from './job-views';
import { ALL_QUEUES, type QueueName } from './queue-names';

const FAILED_SHOWN = 20;
const ACTIVE_SHOWN = 50;

/** What the Jobs page reads and the one thing it changes: retrying a failed job. */
@Injectable()
export class JobsAdminService {
  constructor(
    private readonly moduleRef: ModuleRef,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly audit: AuditService,
  ) {}

  list(): Promise<JobQueueView[]> {
    return Promise.all(ALL_QUEUES.map((name) => this.view(name)));
  }

  async retry(context: SignedInContext, queueName: string, jobId: string): Promise<JobQueueView> {
    const name = this.known(queueName);
    const job = await this.queue(name).getJob(jobId);
    if (!job) throw new NotFoundException(`No job ${jobId} in the queue "${name}".`);
    const state = await job.getState();
    if (state !== 'failed') {
      throw new ConflictException(
        `Job ${jobId} in the queue "${name}" is ${state}; only a failed job can be retried.`,
      );
    }
    // The audit entry stands only if Bull took the retry: a refused retry rolls it back.
    await this.sequelize.transaction(async (transaction) => {
      await this.audit.record(
        context,
        {
          action: 'job.retried',
          entityType: 'job',
          entityId: `${name}/${jobId}`,
          before: { state, failedReason: job.failedReason ?? null, attemptsMade: job.attemptsMade },
          after: { state: 'waiting' },
        },
        transaction,
      );
      await job.retry();
    });
    return this.view(name);
  }

  private known(queueName: string): QueueName {
    const name = ALL_QUEUES.find((candidate) => String(candidate) === queueName);
    if (!name) {
      throw new NotFoundException(
        `No queue named "${queueName}"; the queues are ${ALL_QUEUES.join(', ')}.`,
      );
    }
    return name;
  }

  private queue(name: QueueName): Queue {
    return this.moduleRef.get<Queue>(getQueueToken(name), { strict: false });
  }

  private async view(name: QueueName): Promise<JobQueueView> {
    const queue = this.queue(name);
    const [counts, active, failed, repeatable] = await Promise.all([
      queue.getJobCounts(),
      queue.getActive(0, ACTIVE_SHOWN - 1),
      queue.getFailed(0, FAILED_SHOWN - 1),
      queue.getRepeatableJobs(),
    ]);
    return toJobQueueView(name, counts, active, failed, repeatable);
  }
}
