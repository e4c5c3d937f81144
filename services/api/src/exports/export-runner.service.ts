import { Inject, Injectable, Optional } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { mkdir, rm } from 'node:fs/promises';
import { join } from 'node:path';
import { ActorLoader } from '../auth/actor-loader.service';
import { AppConfig } from '../config/app-config';
import { FileStorage } from '../storage/file-storage';
import type { ExportProducer, ExportResult } from './export-producer';
import { ExportRecord, paramsOf } from './models/export-record.model';
import { TableProducers } from './producers/table-producers';

/** The impact pack's producer (ImpactPackModule's), provided in ExportsJobsModule. */
export const IMPACT_PACK_PRODUCER = Symbol('IMPACT_PACK_PRODUCER');

/** A failure whose message is meant for the person who asked (shown as the export's error). */
export class ExportFailure extends Error {}

/** Runs one export: the row's state, the producer, the file's move into storage. */
@Injectable()
export class ExportRunner {
  constructor(
    @InjectModel(ExportRecord) private readonly exports: typeof ExportRecord,
    private readonly actors: ActorLoader,
    private readonly tables: TableProducers,
    private readonly storage: FileStorage,
    private readonly config: AppConfig,
    @Optional()
    @Inject(IMPACT_PACK_PRODUCER)
    private readonly impactPack: ExportProducer<unknown> | null = null,
  ) {}

  /**
   * Writes the file from scratch (a retry repeats every step); returns without work when the
   * export is already finished, so a duplicate job is harmless.
   */
  async run(exportId: string): Promise<ExportResult | null> {
    const row = await this.exports.findByPk(exportId);
    if (!row || row.state === 'done' || row.state === 'expired') return null;
    await row.update({ state: 'running', progress: 0, error: null });

    // The person as of now: a changed role or scope applies, a deactivated one gets nothing.
    const actor = await this.actors.load(row.requestedBy);
    if (!actor)
      throw new ExportFailure('The person who asked for this export can no longer sign in.');
    const producer = row.kind === 'table' ? this.tables.of(row.tableName!) : this.impactPack;
    if (!producer) throw new ExportFailure('This kind of export is not available yet.');

    const folder = join(this.config.uploadsDir, 'exports-in-progress');
    await mkdir(folder, { recursive: true });
    const filePath = join(folder, `${row.id}.${row.format}`);
    await rm(filePath, { force: true });
    let reported = 0;
    try {
      const result = await producer.produce(paramsOf(row), {
        actor,
        filePath,
        xlsxRowsPerSheet: this.config.exportXlsxRowsPerSheet,
        // At most one write per whole percent.
        progress: async (percent) => {
          const next = Math.max(0, Math.min(100, Math.floor(percent)));
          if (next <= reported) return;
          reported = next;
          await this.exports.update({ progress: next }, { where: { id: row.id } });
        },
      });
      const { key, sizeBytes } = await this.storage.putFile(filePath);
      const finishedAt = new Date();
      await row.update({
        state: 'done',
        progress: 100,
        rowCount: result.rows,
        sheetCount: result.sheets,
        fileKey: key,
        sizeBytes,
        finishedAt,
        expiresAt: new Date(finishedAt.getTime() + this.config.exportLinkTtlMinutes * 60_000),
      });
      return result;
    } finally {
      await rm(filePath, { force: true });
    }
  }

  /** After the last attempt: the reason in plain words. */
  async fail(exportId: string, error: unknown): Promise<void> {
    const reason =
      error instanceof ExportFailure
        ? error.message
        : `The export could not be written (${(error as Error).message ?? 'unknown error'}). Please try again.`;
    await this.exports.update(
      { state: 'failed', error: reason.slice(0, 1000), finishedAt: new Date() },
      { where: { id: exportId } },
    );
  }
}
