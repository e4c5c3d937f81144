import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { AuditLogPage } from '@tallyloom/core';
import { auditLogWhere } from './audit-log-query';
import { toAuditLogEntryView } from './audit-log.mappers';
import type { ListAuditLogQuery } from './dto/list-audit-log.query';
import { AuditEntry } from './models/audit-entry.model';

export const AUDIT_LOG_DEFAULT_PAGE_SIZE = 50;

/** Reads the audit log for the viewer, newest first (by entry number, the order of writing). */
@Injectable()
export class AuditLogService {
  constructor(@InjectModel(AuditEntry) private readonly entries: typeof AuditEntry) {}

  async list(query: ListAuditLogQuery): Promise<AuditLogPage> {
    const page = query.page ?? 1;
    const pageSize = query.pageSize ?? AUDIT_LOG_DEFAULT_PAGE_SIZE;
    const { rows, count } = await this.entries.findAndCountAll({
      where: auditLogWhere(query),
      order: [['id', 'DESC']],
      limit: pageSize,
      offset: (page - 1) * pageSize,
    });
    return { items: rows.map(toAuditLogEntryView), total: count, page, pageSize };
  }
}
