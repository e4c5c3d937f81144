import { BadRequestException, Injectable, UnsupportedMediaTypeException } from '@nestjs/common';
import { createHash } from 'node:crypto';
import { cleanDisplayName, scanTypeOf } from '../receipts/scan-files';
import { FileStorage } from '../storage/file-storage';

/** A worksheet attachment put into FileStorage, with what serving it later needs. */
export interface StoredAttachment {
  attachmentKey: string;
  attachmentName: string;
  attachmentMediaType: string;
  attachmentSizeBytes: number;
  attachmentSha256: string;
}

/**
 * Worksheet attachments take the same files as receipt scans (JPEG, PNG, WebP or PDF, told by
 * their content, never the name) under the same upload limit.
 */
@Injectable()
export class SampleAttachments {
  constructor(private readonly storage: FileStorage) {}

  async store(file: Express.Multer.File): Promise<StoredAttachment> {
    if (file.size === 0 || file.buffer.length === 0) {
      const message = 'The attachment is empty.';
      throw new BadRequestException({
        message,
        fields: [{ field: 'attachment', messages: [message] }],
      });
    }
    const type = await scanTypeOf(file.buffer);
    if (!type.accepted) {
      const message = 'Only JPEG, PNG, WebP or PDF files can be attached.';
      throw new UnsupportedMediaTypeException({
        message: `${message} This file is ${type.found}.`,
        fields: [{ field: 'attachment', messages: [message] }],
      });
    }
    const { key } = await this.storage.put(file.buffer);
    return {
      attachmentKey: key,
      attachmentName: cleanDisplayName(file.originalname || 'attachment', type.extension),
      attachmentMediaType: type.mime,
      attachmentSizeBytes: file.buffer.length,
      attachmentSha256: createHash('sha256').update(file.buffer).digest('hex'),
    };
  }
}
