import { Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { AuditLogListParams } from '@tallyloom/core';
import { createReadStream } from 'node:fs';
import { mkdtemp, rm, stat } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Readable } from 'node:stream';
import { Op } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { SignedInContext } from '../common/context/request-context';
import { exportFileName } from '../exports/export-requests';
import { cellsOf, type ExportCells, type ExportTableSpec } from '../exports/writers/export-table';
import { XlsxTableWriter } from '../exports/writers/xlsx-table-writer';
import { auditLogWhere } from './audit-log-query';
import { AUDIT_LOG_ENTITY } from './audit-chain-verifier.service';
import { toAuditLogEntryView } from './audit-log.mappers';
import { AuditService } from './audit.service';
import { AuditEntry } from './models/audit-entry.model';

const EXPORT_BATCH = 1000;

// Source: Microsoft, "Excel specifications and limits": 32,767 characters in a cell.
const MAX_CELL_TEXT = 32_767;

function jsonCell(value: unknown): string | null {
  if (value === null || value === undefined) return null;
  const text = JSON.stringify(value);
  const cut = ' … (cut: the full value is in the viewer)';
  return text.length <= MAX_CELL_TEXT ? text : text.slice(0, MAX_CELL_TEXT - cut.length) + cut;
}

export const AUDIT_LOG_SPEC: ExportTableSpec = {
  sheetName: 'Audit log',
  title: 'Tallyloom audit log',
  columns: [
    { header: 'Entry', key: 'id', kind: 'id', width: 10 },
    { header: 'Occurred (UTC)', key: 'occurredAt', kind: 'timestamp', width: 18 },
    { header: 'Actor e-mail', key: 'actorEmail', kind: 'text', width: 34 },
    { header: 'Actor user id', key: 'actorUserId', kind: 'id', width: 12 },
    { header: 'Action', key: 'action', kind: 'text', width: 28 },
    { header: 'Entity type', key: 'entityType', kind: 'text', width: 18 },
    { header: 'Entity id', key: 'entityId', kind: 'text', width: 12 },
    { header: 'Before (JSON)', key: 'before', kind: 'text', width: 40 },
    { header: 'After (JSON)', key: 'after', kind: 'text', width: 40 },
    { header: 'Request id', key: 'requestId', kind: 'text', width: 38 },
    { header: 'IP address', key: 'ip', kind: 'text', width: 16 },
    { header: 'Chain position', key: 'chainSeq', kind: 'id', width: 14 },
    { header: 'Entry hash (SHA-256)', key: 'entryHash', kind: 'text', width: 66 },
  ],
};

function withoutPaging(filters: AuditLogListParams): AuditLogListParams {
  const rest = { ...filters };
  delete rest.page;
  delete rest.pageSize;
  return rest;
}

export interface AuditLogFile {
  stream: Readable;
  fileName: string;
  sizeBytes: number;
}

/**
 * The filtered log as one xlsx file, newest first like the viewer. Written with the exports'
 * streaming writer to a temporary file (keyset pages, flat memory) and removed once sent.
 */
@Injectable()
export class AuditLogExport {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(AuditEntry) private readonly entries: typeof AuditEntry,
    private readonly audit: AuditService,
  ) {}

  async file(context: SignedInContext, filters: AuditLogListParams): Promise<AuditLogFile> {
    const where = auditLogWhere(filters);
    const folder = await mkdtemp(join(tmpdir(), 'tallyloom-audit-log-'));
    const now = new Date();
    const fileName = exportFileName('audit-log', 'xlsx', now);
    const path = join(folder, fileName);
    try {
      const outcome = await new XlsxTableWriter({ created: now }).write(
        path,
        AUDIT_LOG_SPEC,
        this.batches(where),
      );
      await this.sequelize.transaction((transaction) =>
        this.audit.record(
          context,
          {
            action: 'audit_log.exported',
            entityType: AUDIT_LOG_ENTITY,
            after: { filters: withoutPaging(filters), rows: outcome.rows },
          },
          transaction,
        ),
      );
      const { size } = await stat(path);
      const stream = createReadStream(path);
      stream.on('close', () => void rm(folder, { recursive: true, force: true }));
      return { stream, fileName, sizeBytes: size };
    } catch (error) {
      await rm(folder, { recursive: true, force: true });
      throw error;
    }
  }

  private async *batches(where: ReturnType<typeof auditLogWhere>): AsyncIterable<ExportCells[]> {
    let before: number | null = null;
    for (;;) {
      const page: AuditEntry[] = await this.entries.findAll({
        where: before === null ? where : { [Op.and]: [where, { id: { [Op.lt]: before } }] },
        order: [['id', 'DESC']],
        limit: EXPORT_BATCH,
      });
      if (page.length === 0) return;
      yield page.map((entry) => {
        const view = toAuditLogEntryView(entry);
        return cellsOf(AUDIT_LOG_SPEC.columns, {
          id: view.id,
          occurredAt: view.occurredAt,
          actorEmail: view.actorEmail,
          actorUserId: view.actorUserId,
          action: view.action,
          entityType: view.entityType,
          entityId: view.entityId,
          before: jsonCell(view.before),
          after: jsonCell(view.after),
          requestId: view.requestId,
          ip: view.ip,
          chainSeq: view.chainSeq,
          entryHash: view.entryHash,
        });
      });
      if (page.length < EXPORT_BATCH) return;
      before = Number(page[page.length - 1].id);
    }
  }
}
