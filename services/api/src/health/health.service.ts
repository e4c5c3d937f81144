import { getQueueToken } from '@nestjs/bull';
import { Injectable } from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';
import { InjectConnection } from '@nestjs/sequelize';
import type { DatabaseHealth, QueueHealth } from '@tallyloom/core';
import type { Queue } from 'bull';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ALL_QUEUES } from '../jobs/queue-names';
import type { HealthReportDto } from './dto/health-report.dto';

/** A probe that cannot answer within this time counts as down: health must never hang. */
const PROBE_TIMEOUT_MS = 2000;

const APP_VERSION: string = (
  JSON.parse(readFileSync(join(__dirname, '..', '..', 'package.json'), 'utf8')) as {
    version: string;
  }
).version;

@Injectable()
export class HealthService {
  private readonly startedAt = Date.now();

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly moduleRef: ModuleRef,
  ) {}

  async report(): Promise<HealthReportDto> {
    const [database, queue] = await Promise.all([this.checkDatabase(), this.checkQueues()]);
    return {
      status: database.status === 'up' && queue.status === 'up' ? 'ok' : 'degraded',
      version: APP_VERSION,
      uptimeSeconds: Math.round((Date.now() - this.startedAt) / 1000),
      database,
      queue,
    };
  }

  private async checkDatabase(): Promise<DatabaseHealth> {
    try {
      const [row] = await withTimeout(
        this.sequelize.query<{ version: string }>('SELECT VERSION() AS version', {
          type: QueryTypes.SELECT,
        }),
      );
      return { status: 'up', version: row?.version };
    } catch (error) {
      return { status: 'down', error: (error as Error).message };
    }
  }

  private async checkQueues(): Promise<QueueHealth> {
    try {
      const queues = await withTimeout(
        Promise.all(
          ALL_QUEUES.map(async (name) => {
            const queue = this.moduleRef.get<Queue>(getQueueToken(name), { strict: false });
            await queue.client.ping();
            const counts = await queue.getJobCounts();
            return {
              name,
              waiting: counts.waiting,
              active: counts.active,
              failed: counts.failed,
              delayed: counts.delayed,
            };
          }),
        ),
      );
      return { status: 'up', queues };
    } catch (error) {
      return { status: 'down', error: (error as Error).message };
    }
  }
}

function withTimeout<T>(promise: Promise<T>): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<never>((_, reject) => {
    timer = setTimeout(
      () => reject(new Error(`no answer within ${PROBE_TIMEOUT_MS} ms`)),
      PROBE_TIMEOUT_MS,
    );
  });
  return Promise.race([promise, timeout]).finally(() => clearTimeout(timer));
}
