import { Global, Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { AuditChainSealer } from './audit-chain-sealer.service';
import { AuditChainScheduler } from './audit-chain.scheduler';
import { AuditChainVerifier } from './audit-chain-verifier.service';
import { AuditLogExport } from './audit-log-export.service';
import { AuditLogController } from './audit-log.controller';
import { AuditLogService } from './audit-log.service';
import { AuditService } from './audit.service';
import { AuditEntry } from './models/audit-entry.model';
import { AuditVerification } from './models/audit-verification.model';

/** Global: every feature records its writes through AuditService. */
@Global()
@Module({
  imports: [SequelizeModule.forFeature([AuditEntry, AuditVerification])],
  controllers: [AuditLogController],
  providers: [
    AuditService,
    AuditChainScheduler,
    AuditChainSealer,
    AuditChainVerifier,
    AuditLogService,
    AuditLogExport,
  ],
  exports: [AuditService, AuditChainSealer, AuditChainVerifier],
})
export class AuditModule {}
