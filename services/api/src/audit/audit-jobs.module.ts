import { Module } from '@nestjs/common';
import { AuditChainProcessor } from './audit-chain.processor';

/** The audit chain's processor; listed in jobs/processor-modules.ts. AuditModule is global. */
@Module({
  providers: [AuditChainProcessor],
})
export class AuditJobsModule {}
