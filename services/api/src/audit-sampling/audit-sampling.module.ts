import { Module } from '@nestjs/common';
import { MulterModule } from '@nestjs/platform-express';
import { SequelizeModule } from '@nestjs/sequelize';
import { memoryStorage } from 'multer';
import { Chapter } from '../chapters/models/chapter.model';
import { AppConfig } from '../config/app-config';
import { ParcelReceipt } from '../receipts/models/parcel-receipt.model';
import { Region } from '../regions/models/region.model';
import { StorageModule } from '../storage/storage.module';
import { MonthlyTally } from '../tallies/models/monthly-tally.model';
import { User } from '../users/models/user.model';
import { AuditSamplesController } from './audit-samples.controller';
import { AuditSamplesService } from './audit-samples.service';
import { AuditSampleItem } from './models/audit-sample-item.model';
import { AuditSample } from './models/audit-sample.model';
import { SampleAttachments } from './sample-attachments';
import { SampleItemInScopeGuard } from './sample-item-in-scope.guard';
import { SamplePopulations } from './sample-population';
import { SampleWorksheetController } from './sample-worksheet.controller';
import { SampleWorksheetService } from './sample-worksheet.service';

/** Attribute sampling for audit (issue #8): plan, draw, and the worksheet of each sample. */
@Module({
  imports: [
    SequelizeModule.forFeature([
      AuditSample,
      AuditSampleItem,
      // The populations and the places they are scoped to.
      ParcelReceipt,
      MonthlyTally,
      Region,
      Chapter,
      User,
    ]),
    StorageModule,
    // Attachments are checked by content before anything is stored, as receipt scans are.
    MulterModule.registerAsync({
      inject: [AppConfig],
      useFactory: (config: AppConfig) => ({
        storage: memoryStorage(),
        limits: { fileSize: config.uploadMaxBytes, files: 1, fields: 5 },
        defParamCharset: 'utf8',
      }),
    }),
  ],
  controllers: [AuditSamplesController, SampleWorksheetController],
  providers: [
    AuditSamplesService,
    SampleWorksheetService,
    SamplePopulations,
    SampleAttachments,
    SampleItemInScopeGuard,
  ],
})
export class AuditSamplingModule {}
