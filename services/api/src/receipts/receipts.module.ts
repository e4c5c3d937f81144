import { Module } from '@nestjs/common';
import { MulterModule } from '@nestjs/platform-express';
import { SequelizeModule } from '@nestjs/sequelize';
import { memoryStorage } from 'multer';
import { AuditEntry } from '../audit/models/audit-entry.model';
import { BlanketSize } from '../blanket-sizes/models/blanket-size.model';
import { CampaignsModule } from '../campaigns/campaigns.module';
import { Campaign } from '../campaigns/models/campaign.model';
import { Chapter } from '../chapters/models/chapter.model';
import { AppConfig } from '../config/app-config';
import { SettingsModule } from '../settings/settings.module';
import { StorageModule } from '../storage/storage.module';
import { ParcelReceipt } from './models/parcel-receipt.model';
import { ImportInScopeGuard } from './import/import-in-scope.guard';
import { PendingImportStore } from './import/import-store';
import { ImportBatch } from './import/models/import-batch.model';
import { ReceiptImportController } from './import/receipt-import.controller';
import { ReceiptImportService } from './import/receipt-import.service';
import { ReceiptFinishedBlanket } from './models/receipt-finished-blanket.model';
import { ReceiptScan } from './models/receipt-scan.model';
import { ReceiptReferenceData } from './receipt-reference-data';
import { ReceiptScansController } from './receipt-scans.controller';
import { ReceiptScansService } from './receipt-scans.service';
import { ReceiptsController } from './receipts.controller';
import { ReceiptsService } from './receipts.service';

@Module({
  imports: [
    SequelizeModule.forFeature([
      ParcelReceipt,
      ReceiptFinishedBlanket,
      ReceiptScan,
      ImportBatch,
      Chapter,
      // Targets of the receipt's own associations.
      Campaign,
      BlanketSize,
      AuditEntry,
    ]),
    CampaignsModule,
    SettingsModule,
    StorageModule,
    // Scans are checked by content before anything is stored, so they are held in memory first.
    MulterModule.registerAsync({
      inject: [AppConfig],
      useFactory: (config: AppConfig) => ({
        storage: memoryStorage(),
        limits: { fileSize: config.uploadMaxBytes, files: 1, fields: 5 },
        defParamCharset: 'utf8',
      }),
    }),
  ],
  // The import routes first: `receipts/imports/template.csv` must not reach `receipts/:id`.
  controllers: [ReceiptImportController, ReceiptsController, ReceiptScansController],
  providers: [
    ReceiptsService,
    ReceiptScansService,
    ReceiptReferenceData,
    ReceiptImportService,
    PendingImportStore,
    ImportInScopeGuard,
  ],
})
export class ReceiptsModule {}
