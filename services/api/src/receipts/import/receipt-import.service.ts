import {
  BadRequestException,
  ConflictException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { FieldProblem, ImportPreviewRow, ReceiptImportField } from '@tallyloom/core';
import { createHash } from 'node:crypto';
import { UniqueConstraintError } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../../audit/audit.service';
import { Chapter } from '../../chapters/models/chapter.model';
import type { Actor } from '../../common/access/actor';
import { chapterScope, within } from '../../common/access/scope';
import type { SignedInContext } from '../../common/context/request-context';
import { createValidationPipe } from '../../common/pipes/validation.pipe';
import { ReceiptInputDto } from '../dto/receipt-input.dto';
import { ParcelReceipt } from '../models/parcel-receipt.model';
import { ReceiptFinishedBlanket } from '../models/receipt-finished-blanket.model';
import { ReceiptReferenceData } from '../receipt-reference-data';
import { uncreditedWarning } from '../receipt.mappers';
import { latestToday, receiptProblems, receiptValues, type ResolvedInput } from '../receipt-rules';
import { cleanDisplayName } from '../scan-files';
import type {
  CommitImportDto,
  ImportCommitDto,
  ImportPreviewDto,
  ImportUploadDto,
  PreviewImportDto,
} from './dto/receipt-import.dto';
import { fileProblem, readSheet } from './import-files';
import {
  finishedSizeId,
  isFixedField,
  mapRow,
  rowProblems,
  suggestMapping,
  type ColumnPlan,
  type ImportMapping,
} from './import-mapping';
import { PendingImportStore, type PendingImport } from './import-store';
import { ImportBatch } from './models/import-batch.model';

export const IMPORT_BATCH_ENTITY = 'import_batch';

const SAMPLE_ROWS = 5;
/** Rows per INSERT on commit: well under MariaDB's packet limit, few round trips. */
const INSERT_CHUNK = 1000;

const notFound = () =>
  new NotFoundException('No such import; it may have expired, upload the file again.');

/** A row as checked: what the preview shows, and the stored values when it has no error. */
interface CheckedRow {
  preview: ImportPreviewRow;
  resolved: ResolvedInput | null;
}

@Injectable()
export class ReceiptImportService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(ImportBatch) private readonly batches: typeof ImportBatch,
    @InjectModel(ParcelReceipt) private readonly receipts: typeof ParcelReceipt,
    @InjectModel(ReceiptFinishedBlanket)
    private readonly finishedBlankets: typeof ReceiptFinishedBlanket,
    @InjectModel(Chapter) private readonly chapters: typeof Chapter,
    private readonly reference: ReceiptReferenceData,
    private readonly store: PendingImportStore,
    private readonly audit: AuditService,
  ) {}

  async upload(
    context: SignedInContext,
    chapterId: number,
    file: Express.Multer.File | undefined,
  ): Promise<ImportUploadDto> {
    const chapter = await this.chapterInScope(context.actor, chapterId);
    if (!chapter) throw new NotFoundException('No such chapter.');
    if (!file) throw fileProblem("Attach the sheet as the multipart form field 'file'.");
    const sheet = await readSheet(file.buffer);
    const sha256 = createHash('sha256').update(file.buffer).digest('hex');
    await this.refuseImportedBefore(sha256);
    const sizes = await this.reference.activeBlanketSizes();
    const pending = this.store.add({
      chapterId: chapter.id,
      uploadedBy: context.actor.id,
      fileName: cleanDisplayName(file.originalname, sheet.fileType),
      sha256,
      sheet,
    });
    return {
      importId: pending.id,
      chapterId: chapter.id,
      fileName: pending.fileName,
      sha256,
      fileType: sheet.fileType,
      headers: sheet.headers,
      rowCount: sheet.rows.length,
      suggestedMapping: suggestMapping(sheet.headers, sizes),
      sampleRows: sheet.rows
        .slice(0, SAMPLE_ROWS)
        .map((row) =>
          Object.fromEntries(sheet.headers.map((header, i) => [header, row.cells[i] ?? null])),
        ),
      expiresAt: pending.expiresAt.toISOString(),
    };
  }

  async preview(
    context: SignedInContext,
    importId: string,
    body: PreviewImportDto,
  ): Promise<ImportPreviewDto> {
    const pending = await this.pendingFor(context.actor, importId);
    const plan = await this.plan(pending, body.mapping);
    const mappingKey = JSON.stringify(plan);
    let rows = pending.checked?.mappingKey === mappingKey ? pending.checked.rows : null;
    if (!rows) {
      rows = (await this.check(pending, plan)).map((row) => row.preview);
      pending.checked = { mappingKey, rows };
    }
    const only = body.only ?? 'all';
    const page = body.page ?? 1;
    const pageSize = body.pageSize ?? 100;
    const selected =
      only === 'errors'
        ? rows.filter((row) => row.errors.length > 0)
        : only === 'warnings'
          ? rows.filter((row) => row.warnings.length > 0)
          : rows;
    const withErrors = rows.filter((row) => row.errors.length > 0);
    return {
      rowCount: rows.length,
      validCount: rows.length - withErrors.length,
      errorCount: withErrors.length,
      warningCount: rows.filter((row) => row.warnings.length > 0).length,
      page,
      pageSize,
      total: selected.length,
      rows: selected.slice((page - 1) * pageSize, page * pageSize),
      rowErrors: withErrors.map(({ rowNumber, errors }) => ({ rowNumber, errors })),
    };
  }

  /** All rows or none: checked again here, since the catalogue or settings may have changed. */
  async commit(
    context: SignedInContext,
    importId: string,
    body: CommitImportDto,
  ): Promise<ImportCommitDto> {
    const pending = await this.pendingFor(context.actor, importId);
    await this.refuseImportedBefore(pending.sha256);
    const checked = await this.check(pending, await this.plan(pending, body.mapping));
    const failed = checked.filter((row) => row.resolved === null);
    if (failed.length > 0) {
      const fields: FieldProblem[] = failed.flatMap(({ preview }) =>
        preview.errors.map((error) => ({
          field: `rows.${preview.rowNumber}.${error.field}`,
          messages: [`Row ${preview.rowNumber}: ${error.message}`],
        })),
      );
      throw new BadRequestException({
        message: `${failed.length} of ${checked.length} rows have errors, so nothing was imported. Correct them in the file and upload it again.`,
        fields,
      });
    }
    const resolved = checked.map((row) => row.resolved as ResolvedInput);
    const batchId = await this.sequelize
      .transaction(async (transaction) => {
        const batch = await this.batches.create(
          {
            chapterId: pending.chapterId,
            fileSha256: pending.sha256,
            fileName: pending.fileName,
            rowCount: resolved.length,
            createdBy: context.actor.id,
          },
          { transaction },
        );
        for (let start = 0; start < resolved.length; start += INSERT_CHUNK) {
          const chunk = resolved.slice(start, start + INSERT_CHUNK);
          const created = await this.receipts.bulkCreate(
            chunk.map(({ values }) => ({
              ...values,
              importBatchId: batch.id,
              createdBy: context.actor.id,
              version: 1,
            })),
            { transaction },
          );
          const blankets = chunk.flatMap(({ finishedBlankets }, i) =>
            finishedBlankets.map((row) => ({ ...row, receiptId: created[i].id })),
          );
          if (blankets.length > 0)
            await this.finishedBlankets.bulkCreate(blankets, { transaction });
        }
        // The batch, the file's hash and the count; no sender details, no file name (it may
        // name a person), since the audit log can never be erased.
        await this.audit.record(
          context,
          {
            action: 'receipt.import_committed',
            entityType: IMPORT_BATCH_ENTITY,
            entityId: batch.id,
            after: {
              batchId: batch.id,
              chapterId: pending.chapterId,
              fileSha256: pending.sha256,
              rowCount: resolved.length,
            },
          },
          transaction,
        );
        return batch.id;
      })
      .catch(async (error: unknown) => {
        // Two commits of the same file racing: the unique hash lets one through.
        if (error instanceof UniqueConstraintError) await this.refuseImportedBefore(pending.sha256);
        throw error;
      });
    pending.checked = undefined;
    return { batchId, created: resolved.length };
  }

  /** The upload, if this person made it and its chapter is still in their scope. */
  async pendingFor(actor: Actor, importId: string): Promise<PendingImport> {
    const pending = this.store.get(importId);
    if (!pending || pending.uploadedBy !== actor.id) throw notFound();
    if (!(await this.chapterInScope(actor, pending.chapterId))) throw notFound();
    return pending;
  }

  private chapterInScope(actor: Actor, chapterId: number): Promise<Chapter | null> {
    return this.chapters.findOne({ where: within(chapterScope(actor), { id: chapterId }) });
  }

  private async refuseImportedBefore(sha256: string): Promise<void> {
    const earlier = await this.batches.findOne({ where: { fileSha256: sha256 } });
    if (!earlier) return;
    const on = earlier.createdAt.toISOString().slice(0, 10);
    throw new ConflictException({
      message: `This file was already imported on ${on} as batch ${earlier.id}.`,
      fields: [
        {
          field: 'file',
          messages: [`This file was already imported on ${on} as batch ${earlier.id}.`],
        },
      ],
    });
  }

  /** The columns to read and the field each fills; every mistake in the mapping at once. */
  private async plan(pending: PendingImport, mapping: ImportMapping): Promise<ColumnPlan[]> {
    const problems: FieldProblem[] = [];
    const problem = (field: string, message: string) =>
      problems.push({ field, messages: [message] });
    const headers = pending.sheet.headers;
    const plan: ColumnPlan[] = [];
    const mappedFrom = new Map<ReceiptImportField, string>();
    for (const [header, field] of Object.entries(mapping)) {
      const index = headers.indexOf(header);
      if (index < 0) problem(`mapping.${header}`, `No column is headed "${header}" in this file.`);
      else if (field === null || field === undefined) continue;
      else if (!isFixedField(field) && finishedSizeId(field) === null)
        problem(
          `mapping.${header}`,
          `"${String(field)}" is not a receipt field; map the column to a field or to null.`,
        );
      else if (mappedFrom.has(field))
        problem(
          `mapping.${header}`,
          `${field} is already filled from column "${mappedFrom.get(field)}".`,
        );
      else {
        mappedFrom.set(field, header);
        plan.push({ index, header, field });
      }
    }
    if (!mappedFrom.has('receivedOn'))
      problem('mapping', 'Map one column to receivedOn, the date each parcel arrived.');
    const sizeIds = plan.map((c) => finishedSizeId(c.field)).filter((id) => id !== null);
    const sizes = new Map(
      (await this.reference.blanketSizes(sizeIds)).map((size) => [size.id, size]),
    );
    for (const column of plan) {
      const sizeId = finishedSizeId(column.field);
      if (sizeId === null) continue;
      const size = sizes.get(sizeId);
      if (!size) problem(`mapping.${column.header}`, `No blanket size has the id ${sizeId}.`);
      else if (!size.active)
        problem(`mapping.${column.header}`, `The blanket size ${size.name} is no longer in use.`);
    }
    if (problems.length > 0)
      throw new BadRequestException({
        message: `Invalid input: ${[...new Set(problems.map((p) => p.field))].join(', ')}`,
        fields: problems,
      });
    return plan.sort((a, b) => a.index - b.index);
  }

  /**
   * Every row through the receipt form's own checks: the same DTO, pipe and rules, then the
   * campaign lookup (an unknown code is a warning, as on the form).
   */
  private async check(pending: PendingImport, plan: ColumnPlan[]): Promise<CheckedRow[]> {
    const chapter = await this.chapters.findByPk(pending.chapterId);
    if (!chapter) throw notFound();
    const settings = await this.reference.settings();
    const sizeIds = plan.map((c) => finishedSizeId(c.field)).filter((id) => id !== null);
    const sizes = new Map(
      (await this.reference.blanketSizes(sizeIds)).map((size) => [size.id, size]),
    );
    const rules = {
      chapter,
      ceiling: settings.receiptCountCeiling,
      sizes,
      senderErased: false,
      today: latestToday(),
    };
    const pipe = createValidationPipe();
    const headerOf = new Map(plan.map((column) => [column.field, column.header]));
    const campaigns = new Map<string, Promise<number | null>>();
    const campaignOf = (code: string, onDate: string) => {
      const key = `${code.trim().toUpperCase()}|${onDate}`;
      let found = campaigns.get(key);
      if (!found) {
        found = this.reference
          .findCreditableCampaign(code, onDate, chapter.regionId)
          .then((campaign) => campaign?.id ?? null);
        campaigns.set(key, found);
      }
      return found;
    };

    const checked: CheckedRow[] = [];
    for (const row of pending.sheet.rows) {
      const mapped = mapRow(row.cells, plan, chapter.id);
      let input: ReceiptInputDto | null = null;
      let problems: FieldProblem[];
      try {
        input = (await pipe.transform(mapped.input, {
          type: 'body',
          metatype: ReceiptInputDto,
        })) as ReceiptInputDto;
        problems = receiptProblems(input, rules);
      } catch (error) {
        if (!(error instanceof BadRequestException)) throw error;
        problems = (error.getResponse() as { fields?: FieldProblem[] }).fields ?? [];
      }
      const errors = rowProblems(problems, mapped, headerOf);
      const warnings = [...mapped.warnings];
      let resolved: ResolvedInput | null = null;
      if (input && errors.length === 0) {
        const code = input.campaignCode ?? null;
        const campaignId = code ? await campaignOf(code, input.receivedOn) : null;
        if (code && campaignId === null)
          warnings.push({
            field: 'campaignCode',
            column: headerOf.get('campaignCode') ?? null,
            message: uncreditedWarning(code, input.receivedOn),
          });
        resolved = receiptValues(input, chapter.id, campaignId);
      }
      checked.push({
        preview: { rowNumber: row.rowNumber, values: mapped.values, errors, warnings },
        resolved,
      });
    }
    return checked;
  }
}
