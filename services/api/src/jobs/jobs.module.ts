import { BullModule, getQueueToken } from '@nestjs/bull';
import { Global, Logger, Module, type OnModuleInit } from '@nestjs/common';
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
      useFactory: (config: AppConfig) => ({ url: config.redisUrl, prefix: 'tallyloom' }),
    }),
    BullModule.registerQueue(...ALL_QUEUES.map((name) => ({ name }))),
  ],
  exports: [BullModule],
})
export class JobsModule implements OnModuleInit {
  private readonly logger = new Logger('Jobs');

  constructor(private readonly moduleRef: ModuleRef) {}

  onModuleInit(): void {
    // A queue emits 'error' when Redis goes away; unheard, that event would end the process.
    for (const name of ALL_QUEUES) {
      const queue = this.moduleRef.get<Queue>(getQueueToken(name), { strict: false });
      queue.on('error', (error: Error) => this.logger.warn(`queue ${name}: ${error.message}`));
    }
  }
}
