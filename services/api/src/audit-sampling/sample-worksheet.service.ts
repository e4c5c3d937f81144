import { Injectable, Logger, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { WorksheetEntryRequest } from '@tallyloom/core';
import type { Readable } from 'node:stream';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service';
import type { Actor } from '../common/access/actor';
import type { SignedInContext } from '../common/context/request-context';
import { invalidField } from '../common/validation/field-errors';
import { FileStorage, StoredFileMissing } from '../storage/file-storage';
import { AuditSamplesService, SAMPLE_ENTITY } from './audit-samples.service';
import type { AuditSampleDto } from './dto/audit-sample-view.dto';
import { AuditSampleItem } from './models/audit-sample-item.model';
import { SampleAttachments, type StoredAttachment } from './sample-attachments';

export interface AttachmentFile {
  stream: Readable;
  mediaType: string;
  fileName: string;
  sizeBytes: number;
}

/** The auditor's worksheet: what each drawn item showed, with an optional attachment. */
@Injectable()
export class SampleWorksheetService {
  private readonly logger = new Logger('SampleWorksheet');

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(AuditSampleItem) private readonly items: typeof AuditSampleItem,
    private readonly samples: AuditSamplesService,
    private readonly attachments: SampleAttachments,
    private readonly storage: FileStorage,
    private readonly audit: AuditService,
  ) {}

  /**
   * Records (or corrects) one item. A new attachment replaces the earlier one; without one the
   * earlier attachment stays. Returns the whole sample, so the totals come back with it.
   */
  async record(
    context: SignedInContext,
    sampleId: number,
    itemId: number,
    entry: WorksheetEntryRequest,
    file: Express.Multer.File | undefined,
  ): Promise<AuditSampleDto> {
    await this.findItem(context.actor, sampleId, itemId);
    const note = entry.note ?? null;
    if (entry.result === 'deviation' && !note) {
      throw invalidField('note', 'Say what was wrong: a deviation needs a note.');
    }
    const stored = file ? await this.attachments.store(file) : null;
    let replacedKey: string | null;
    try {
      replacedKey = await this.sequelize.transaction(async (transaction) => {
        const item = await this.items.findOne({
          where: { sampleId, itemId },
          transaction,
          lock: transaction.LOCK.UPDATE,
        });
        if (!item) throw new NotFoundException('No such item in this audit sample.');
        const before = auditableEntry(item);
        const previousKey = item.attachmentKey;
        await item.update(
          {
            result: entry.result,
            note,
            recordedBy: context.actor.id,
            recordedAt: new Date(),
            ...(stored ?? {}),
          },
          { transaction },
        );
        await this.audit.record(
          context,
          {
            action: 'audit_sample.item_recorded',
            entityType: SAMPLE_ENTITY,
            entityId: sampleId,
            before,
            after: auditableEntry(item),
          },
          transaction,
        );
        return stored ? previousKey : null;
      });
    } catch (error) {
      if (stored) await this.removeQuietly(stored);
      throw error;
    }
    // Only once the new row is saved: a leftover file is harmless, a missing one is not.
    if (replacedKey) {
      await this.storage
        .remove(replacedKey)
        .catch((error: Error) =>
          this.logger.error(`could not remove a replaced attachment: ${error.message}`),
        );
    }
    return this.samples.get(context.actor, sampleId);
  }

  async openAttachment(actor: Actor, sampleId: number, itemId: number): Promise<AttachmentFile> {
    const item = await this.findItem(actor, sampleId, itemId);
    if (!item.attachmentKey) throw new NotFoundException('This item has no attachment.');
    try {
      return {
        stream: await this.storage.get(item.attachmentKey),
        mediaType: item.attachmentMediaType ?? 'application/octet-stream',
        fileName: item.attachmentName ?? 'attachment',
        sizeBytes: item.attachmentSizeBytes ?? 0,
      };
    } catch (error) {
      if (!(error instanceof StoredFileMissing)) throw error;
      this.logger.error(`attachment of sample ${sampleId} item ${itemId}: ${error.message}`);
      throw new NotFoundException('The file of this attachment is missing from storage.');
    }
  }

  private async findItem(actor: Actor, sampleId: number, itemId: number): Promise<AuditSampleItem> {
    await this.samples.findInScope(actor, sampleId);
    const item = await this.items.findOne({ where: { sampleId, itemId } });
    if (!item) throw new NotFoundException('No such item in this audit sample.');
    return item;
  }

  private async removeQuietly(stored: StoredAttachment): Promise<void> {
    await this.storage.remove(stored.attachmentKey).catch(() => undefined);
  }
}

function auditableEntry(item: AuditSampleItem): Record<string, unknown> {
  return {
    itemId: item.itemId,
    position: item.position,
    result: item.result,
    note: item.note,
    attachment: item.attachmentKey
      ? {
          fileName: item.attachmentName,
          mediaType: item.attachmentMediaType,
          sizeBytes: item.attachmentSizeBytes,
          sha256: item.attachmentSha256,
        }
      : null,
  };
}
