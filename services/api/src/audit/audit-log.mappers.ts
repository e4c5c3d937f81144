import type { AuditLogEntryView } from '@tallyloom/core';
import { contentOf } from './audit-entry-content';
import type { AuditEntry } from './models/audit-entry.model';

/** The entry as the chain hashes it (so the viewer shows exactly that), with its seal. */
export function toAuditLogEntryView(entry: AuditEntry): AuditLogEntryView {
  return {
    ...contentOf(entry),
    occurredAt: entry.occurredAt.toISOString(),
    sealed: entry.chainSeq !== null,
    chainSeq: entry.chainSeq === null ? null : Number(entry.chainSeq),
    entryHash: entry.entryHash,
  };
}
