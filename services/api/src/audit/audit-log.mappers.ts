import type { AuditLogEntryView } from '@tallyloom/core';
import { jsonValue } from './audit-entry-content';
import type { AuditEntry } from './models/audit-entry.model';

export function toAuditLogEntryView(entry: AuditEntry): AuditLogEntryView {
  return {
    id: Number(entry.id),
    occurredAt: entry.occurredAt.toISOString(),
    actorUserId: entry.actorUserId === null ? null : Number(entry.actorUserId),
    actorEmail: entry.actorEmail,
    action: entry.action,
    entityType: entry.entityType,
    entityId: entry.entityId,
    before: jsonValue(entry.beforeJson),
    after: jsonValue(entry.afterJson),
    requestId: entry.requestId,
    ip: entry.ip,
    sealed: entry.chainSeq !== null,
    chainSeq: entry.chainSeq === null ? null : Number(entry.chainSeq),
    entryHash: entry.entryHash,
  };
}
