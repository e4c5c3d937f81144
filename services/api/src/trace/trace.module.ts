import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { PartnerAgency } from '../agencies/models/partner-agency.model';
import { BlanketSize } from '../blanket-sizes/models/blanket-size.model';
import { Chapter } from '../chapters/models/chapter.model';
import { ParcelReceipt } from '../receipts/models/parcel-receipt.model';
import { ReceiptScan } from '../receipts/models/receipt-scan.model';
import { Region } from '../regions/models/region.model';
import { ReportSnapshot } from '../reports/models/report-snapshot.model';
import { ReportsModule } from '../reports/reports.module';
import { SettingsModule } from '../settings/settings.module';
import { MonthlyTally } from '../tallies/models/monthly-tally.model';
import { TallyBlanketsAssembled } from '../tallies/models/tally-blankets-assembled.model';
import { TallyBlanketsGiven } from '../tallies/models/tally-blankets-given.model';
import { TallyPeopleServed } from '../tallies/models/tally-people-served.model';
import { TallyRevision } from '../tallies/models/tally-revision.model';
import { TallyRevisionsRepository } from '../tallies/tally-revisions.repository';
import { TraceAmendments } from './trace-amendments';
import { TraceController } from './trace.controller';
import { TraceLines } from './trace-lines';
import { TraceReceipts } from './trace-receipts';
import { TraceService } from './trace.service';
import { TraceSubjects } from './trace-subject';

/** The read-only trace of a report figure to its tallies, receipts and scans (issue #8). */
@Module({
  imports: [
    SequelizeModule.forFeature([
      ReportSnapshot,
      Region,
      Chapter,
      MonthlyTally,
      TallyRevision,
      TallyBlanketsAssembled,
      TallyBlanketsGiven,
      TallyPeopleServed,
      ParcelReceipt,
      ReceiptScan,
      // Names for the labels of amended fields.
      BlanketSize,
      PartnerAgency,
    ]),
    SettingsModule,
    ReportsModule,
  ],
  controllers: [TraceController],
  providers: [
    TraceService,
    TraceSubjects,
    TraceLines,
    TraceAmendments,
    TraceReceipts,
    // Reads revisions with their lines as whole tally values; no state of its own.
    TallyRevisionsRepository,
  ],
})
export class TraceModule {}
