import { Process, Processor } from '@nestjs/bull';
import type { AuditVerificationView } from '@tallyloom/core';
import type { Job } from 'bull';
import { QueueName } from '../jobs/queue-names';
import { AuditChainJob } from './audit-chain-job';
import { AuditChainSealer } from './audit-chain-sealer.service';
import { AuditChainVerifier } from './audit-chain-verifier.service';

@Processor(QueueName.AuditLog)
export class AuditChainProcessor {
  constructor(
    private readonly sealer: AuditChainSealer,
    private readonly verifier: AuditChainVerifier,
  ) {}

  @Process(AuditChainJob.Seal)
  async seal(): Promise<{ sealed: number | null }> {
    // A short wait: a sealer holding the lock seals these entries too, or the next run does.
    return { sealed: await this.sealer.sealPending(5) };
  }

  @Process(AuditChainJob.Verify)
  async verify(job: Job): Promise<AuditVerificationView> {
    const result = await this.verifier.verify(
      { actor: null, requestId: `job:${QueueName.AuditLog}:${job.id}`, ip: null },
      'nightly',
    );
    await job.log(
      result.ok
        ? `chain holds: ${result.entriesChecked} entries`
        : `chain broken: ${result.firstBrokenLink?.message}`,
    );
    return result;
  }
}
