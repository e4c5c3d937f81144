import { InjectQueue } from '@nestjs/bull';
import {
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnModuleDestroy,
} from '@nestjs/common';
import type { Queue } from 'bull';
import { QueueName } from '../jobs/queue-names';
import {
  AUDIT_CHAIN_JOB_OPTIONS,
  AuditChainJob,
  NIGHTLY_VERIFY_CRON,
  NIGHTLY_VERIFY_JOB_ID,
  SEAL_EVERY_MINUTE_CRON,
  SEAL_EVERY_MINUTE_JOB_ID,
} from './audit-chain-job';

/** Writes within this window share one seal job. */
export const SEAL_DEBOUNCE_MS = 1000;

/**
 * Queues the chain's jobs: a seal shortly after entries are written (at most one per process per
 * second, so a burst of writes costs one job), and the repeatable seal and nightly verification,
 * which Bull keys by name, id and cron so they exist once however many processes start.
 */
@Injectable()
export class AuditChainScheduler implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('AuditChain');
  private timer: NodeJS.Timeout | null = null;

  constructor(@InjectQueue(QueueName.AuditLog) private readonly queue: Queue) {}

  onApplicationBootstrap(): void {
    // Not awaited: with Redis away Bull waits for it, and the API must start rather than hang.
    void this.scheduleRepeatable();
  }

  onModuleDestroy(): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
  }

  /** After an entry is written; never throws and never waits on Redis. */
  sealSoon(): void {
    if (this.timer) return;
    this.timer = setTimeout(() => {
      this.timer = null;
      this.queue
        .add(AuditChainJob.Seal, {}, AUDIT_CHAIN_JOB_OPTIONS)
        .catch((error: Error) => this.logger.warn(`could not queue a seal: ${error.message}`));
    }, SEAL_DEBOUNCE_MS);
    // A pending seal never keeps a process alive: the every-minute job catches up.
    this.timer.unref();
  }

  private async scheduleRepeatable(): Promise<void> {
    try {
      await this.queue.add(
        AuditChainJob.Seal,
        {},
        {
          ...AUDIT_CHAIN_JOB_OPTIONS,
          jobId: SEAL_EVERY_MINUTE_JOB_ID,
          repeat: { cron: SEAL_EVERY_MINUTE_CRON, tz: 'UTC' },
        },
      );
      await this.queue.add(
        AuditChainJob.Verify,
        {},
        {
          ...AUDIT_CHAIN_JOB_OPTIONS,
          jobId: NIGHTLY_VERIFY_JOB_ID,
          repeat: { cron: NIGHTLY_VERIFY_CRON, tz: 'UTC' },
        },
      );
    } catch (error) {
      this.logger.warn(`could not schedule the audit chain jobs: ${(error as Error).message}`);
    }
  }
}
