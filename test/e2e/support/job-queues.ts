import { getQueueToken } from '@nestjs/bull';
import type { INestApplication } from '@nestjs/common';
import type { Queue } from 'bull';
import type { QueueName } from '../../../services/api/src/jobs/queue-names';

/**
 * The run's Redis, in a database of its own. Every test app of the run processes jobs in-process,
 * so a suite that watches who runs its jobs keeps them away from the others' queues this way.
 */
export function ownRedisUrl(database: number): string {
  const url = new URL(process.env.REDIS_URL ?? 'redis://127.0.0.1:6379');
  url.pathname = `/${database}`;
  return url.toString();
}

export function queueOf(app: INestApplication, name: QueueName): Queue {
  return app.get<Queue>(getQueueToken(name), { strict: false });
}
