import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { AuditSampleItem } from '../audit-sampling/models/audit-sample-item.model';
import { AuditSample } from '../audit-sampling/models/audit-sample.model';
import { ParcelReceipt } from '../receipts/models/parcel-receipt.model';
import { SettingsModule } from '../settings/settings.module';
import { MonthlyTally } from '../tallies/models/monthly-tally.model';
import { User } from '../users/models/user.model';
import { FindingLinks } from './finding-links';
import { FindingsController } from './findings.controller';
import { FindingsService } from './findings.service';
import { AuditFindingLink } from './models/audit-finding-link.model';
import { AuditFindingResponse } from './models/audit-finding-response.model';
import { AuditFinding } from './models/audit-finding.model';

/** Audit findings (issue #8): auditors write them, linked to traces and samples; staff respond. */
@Module({
  imports: [
    SequelizeModule.forFeature([
      AuditFinding,
      AuditFindingLink,
      AuditFindingResponse,
      // What links point at, checked on write.
      AuditSample,
      AuditSampleItem,
      MonthlyTally,
      ParcelReceipt,
      User,
    ]),
    SettingsModule,
  ],
  controllers: [FindingsController],
  providers: [FindingsService, FindingLinks],
})
export class FindingsModule {}
