import { Injectable } from '@nestjs/common';
import type { ExportTable } from '@tallyloom/core';
import type { ExportProducer } from '../export-producer';
import { ReceiptsExportProducer } from './receipts-export.producer';
import { ReviewQueueExportProducer } from './review-queue-export.producer';
import { SnapshotsExportProducer } from './snapshots-export.producer';
import { TalliesExportProducer } from './tallies-export.producer';
import type { TableExportParams } from './table-file';

/** Picks the producer of a table export by its table. */
@Injectable()
export class TableProducers {
  constructor(
    private readonly receipts: ReceiptsExportProducer,
    private readonly tallies: TalliesExportProducer,
    private readonly reviewQueue: ReviewQueueExportProducer,
    private readonly snapshots: SnapshotsExportProducer,
  ) {}

  of(table: ExportTable): ExportProducer<TableExportParams<never>> | null {
    switch (table) {
      case 'receipts':
        return this.receipts;
      case 'tallies':
        return this.tallies;
      case 'review-queue':
        return this.reviewQueue;
      case 'snapshots':
        return this.snapshots;
      default:
        return null;
    }
  }
}
