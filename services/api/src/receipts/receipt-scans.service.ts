import {
  BadRequestException,
  Injectable,
  Logger,
  NotFoundException,
  UnsupportedMediaTypeException,
} from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { createHash } from 'node:crypto';
import type { Readable } from 'node:stream';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import type { Actor } from '../common/access/actor';
import type { SignedInContext } from '../common/context/request-context';
import { FileStorage, StoredFileMissing } from '../storage/file-storage';
import type { ScanDto } from './dto/receipt-view.dto';
import { ReceiptScan } from './models/receipt-scan.model';
import { toScanView } from './receipt.mappers';
import { RECEIPT_ENTITY, ReceiptsService } from './receipts.service';
import { cleanDisplayName, scanTypeOf } from './scan-files';

export interface ScanFile {
  stream: Readable;
  mediaType: string;
  fileName: string;
  sizeBytes: number;
}

@Injectable()
export class ReceiptScansService {
  private readonly logger = new Logger('ReceiptScans');

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(ReceiptScan) private readonly scans: typeof ReceiptScan,
    private readonly receipts: ReceiptsService,
    private readonly storage: FileStorage,
    private readonly audit: AuditService,
  ) {}

  async add(
    context: SignedInContext,
    receiptId: number,
    file: Express.Multer.File | undefined,
  ): Promise<ScanDto> {
    await this.receipts.findInScope(context.actor, receiptId);
    if (!file) throw fileProblem("Attach the scan as the multipart form field 'file'.");
    if (file.size === 0 || file.buffer.length === 0) throw fileProblem('The file is empty.');
    const type = await scanTypeOf(file.buffer);
    if (!type.accepted) {
      throw new UnsupportedMediaTypeException({
        message: `Only JPEG, PNG, WebP or PDF files can be attached; this file is ${type.found}.`,
        fields: [
          { field: 'file', messages: ['Only JPEG, PNG, WebP or PDF files can be attached.'] },
        ],
      });
    }
    const { key } = await this.storage.put(file.buffer);
    try {
      const scan = await this.sequelize.transaction(async (transaction) => {
        const created = await this.scans.create(
          {
            receiptId,
            storageKey: key,
            displayName: cleanDisplayName(file.originalname, type.extension),
            mediaType: type.mime,
            sizeBytes: file.buffer.length,
            sha256: createHash('sha256').update(file.buffer).digest('hex'),
            uploadedBy: context.actor.id,
          },
          { transaction },
        );
        await this.audit.record(
          context,
          {
            action: 'receipt.scan_added',
            entityType: RECEIPT_ENTITY,
            entityId: receiptId,
            after: auditableScan(created),
          },
          transaction,
        );
        return created;
      });
      return toScanView(scan);
    } catch (error) {
      await this.storage.remove(key).catch(() => undefined);
      throw error;
    }
  }

  async open(actor: Actor, receiptId: number, scanId: number): Promise<ScanFile> {
    await this.receipts.findInScope(actor, receiptId);
    const scan = await this.find(receiptId, scanId);
    try {
      return {
        stream: await this.storage.get(scan.storageKey),
        mediaType: scan.mediaType,
        fileName: scan.displayName,
        sizeBytes: scan.sizeBytes,
      };
    } catch (error) {
      if (!(error instanceof StoredFileMissing)) throw error;
      this.logger.error(`scan ${scan.id} of receipt ${receiptId}: ${error.message}`);
      throw new NotFoundException('The file of this scan is missing from storage.');
    }
  }

  async remove(context: SignedInContext, receiptId: number, scanId: number): Promise<void> {
    await this.receipts.findInScope(context.actor, receiptId);
    const scan = await this.find(receiptId, scanId);
    await this.sequelize.transaction(async (transaction) => {
      await scan.destroy({ transaction });
      await this.audit.record(
        context,
        {
          action: 'receipt.scan_removed',
          entityType: RECEIPT_ENTITY,
          entityId: receiptId,
          before: auditableScan(scan),
        },
        transaction,
      );
    });
    // Only once the row is gone for good; a leftover file is harmless, a missing one is not.
    await this.storage
      .remove(scan.storageKey)
      .catch((error: Error) =>
        this.logger.error(`could not remove the file of scan ${scan.id}: ${error.message}`),
      );
  }

  private async find(receiptId: number, scanId: number): Promise<ReceiptScan> {
    const scan = await this.scans.findOne({ where: { id: scanId, receiptId } });
    if (!scan) throw new NotFoundException('No such scan on this receipt.');
    return scan;
  }
}

function fileProblem(message: string): BadRequestException {
  return new BadRequestException({ message, fields: [{ field: 'file', messages: [message] }] });
}

function auditableScan(scan: ReceiptScan): Record<string, unknown> {
  return {
    scanId: scan.id,
    fileName: scan.displayName,
    mediaType: scan.mediaType,
    sizeBytes: scan.sizeBytes,
    sha256: scan.sha256,
  };
}
