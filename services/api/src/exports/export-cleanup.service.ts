import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import { FileStorage } from '../storage/file-storage';
import { ExportRecord } from './models/export-record.model';

/** Removes the files whose links have expired; the rows stay, marked expired, as the record. */
@Injectable()
export class ExportCleanup {
  constructor(
    @InjectModel(ExportRecord) private readonly exports: typeof ExportRecord,
    private readonly storage: FileStorage,
  ) {}

  async removeExpired(now = new Date()): Promise<{ removed: number }> {
    const rows = await this.exports.findAll({
      where: { state: 'done', expiresAt: { [Op.lte]: now } },
      attributes: ['id', 'fileKey'],
    });
    for (const row of rows) {
      // The row first: once expired, no link serves the file, so removing it next is safe.
      await this.exports.update(
        { state: 'expired', fileKey: null },
        { where: { id: row.id, state: 'done' } },
      );
      if (row.fileKey) await this.storage.remove(row.fileKey);
    }
    return { removed: rows.length };
  }
}
