import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { ActorLoader } from '../auth/actor-loader.service';
import { DashboardsModule } from '../dashboards/dashboards.module';
import { ImpactPackModule } from '../impact-pack/impact-pack.module';
import { ImpactPackProducer } from '../impact-pack/impact-pack.producer';
import { ParcelReceipt } from '../receipts/models/parcel-receipt.model';
import { ReceiptFinishedBlanket } from '../receipts/models/receipt-finished-blanket.model';
import { ReceiptScan } from '../receipts/models/receipt-scan.model';
import { StorageModule } from '../storage/storage.module';
import { TalliesModule } from '../tallies/tallies.module';
import { User } from '../users/models/user.model';
import { ExportCleanup } from './export-cleanup.service';
import { ExportCleanupSchedule } from './export-cleanup.schedule';
import { ExportRunner, IMPACT_PACK_PRODUCER } from './export-runner.service';
import { ExportsModule } from './exports.module';
import { ExportsProcessor } from './exports.processor';
import { ReceiptsExportProducer } from './producers/receipts-export.producer';
import { ReviewQueueExportProducer } from './producers/review-queue-export.producer';
import { SnapshotsExportProducer } from './producers/snapshots-export.producer';
import { TalliesExportProducer } from './producers/tallies-export.producer';
import { TallyExportRows } from './producers/tally-export-rows';
import { TableProducers } from './producers/table-producers';

/** The export processor and its producers: imported only where jobs run (jobs/processor-modules.ts). */
@Module({
  imports: [
    ExportsModule,
    StorageModule,
    ImpactPackModule,
    // The list and dashboard code the tallies, review-queue and snapshots exports reuse.
    TalliesModule,
    DashboardsModule,
    SequelizeModule.forFeature([User, ParcelReceipt, ReceiptFinishedBlanket, ReceiptScan]),
  ],
  providers: [
    ExportsProcessor,
    ExportRunner,
    ExportCleanup,
    ExportCleanupSchedule,
    ActorLoader,
    TableProducers,
    ReceiptsExportProducer,
    TallyExportRows,
    TalliesExportProducer,
    ReviewQueueExportProducer,
    SnapshotsExportProducer,
    { provide: IMPACT_PACK_PRODUCER, useExisting: ImpactPackProducer },
  ],
  exports: [ExportCleanup],
})
export class ExportsJobsModule {}
