import { BullModule, getQueueToken } from '@nestjs/bull';
import {
  Global,
  Logger,
  Module,
  type BeforeApplicationShutdown,
  type OnModuleInit,
} from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';
import type { Queue } from 'bull';
import { AppConfig } from '../config/app-config';
import { ALL_QUEUES } from './queue-names';

/** Bull on the Redis from REDIS_URL, with every queue of QueueName registered once. */
@Global()
@Module({
  imports: [
    BullModule.forRootAsync({
      inject: [AppConfig],
      useFactory: (config: AppConfig) => ({
        url: config.redisUrl,
        prefix: 'tallyloom',
        // A worker that dies holding a job loses its lock; another worker's check takes it over.
        settings: { lockDuration: config.jobLockMs, stalledInterval: config.jobStalledCheckMs },
      }),
    }),
    BullModule.registerQueue(...ALL_QUEUES.map((name) => ({ name }))),
  ],
  exports: [BullModule],
})
export class JobsModule implements OnModuleInit, BeforeApplicationShutdown {
  private readonly logger = new Logger('Jobs');

  constructor(private readonly moduleRef: ModuleRef) {}

  onModuleInit(): void {
    // A queue emits 'error' when Redis goes away; unheard, that event would end the process.
    for (const name of ALL_QUEUES) {
      this.queue(name).on('error', (error: Error) =>
        this.logger.warn(`queue ${name}: ${error.message}`),
      );
    }
  }

  /**
   * Closing a queue waits for its running job. Done here, before the shutdown hooks that close
   * the database, so a job finishes with its connections still open (Bull's own close, later,
   * finds the queue closed already).
   */
  async beforeApplicationShutdown(): Promise<void> {
    await Promise.all(ALL_QUEUES.map((name) => this.queue(name).close()));
  }

  private queue(name: string): Queue {
    return this.moduleRef.get<Queue>(getQueueToken(name), { strict: false });
  }
}
