import type { ChainEntryContent, SealedChainEntry } from '@tallyloom/core';
import { orNull } from '../common/sql/column-values';
import type { AuditEntry } from './models/audit-entry.model';

/** JSON columns may come back parsed or as text, depending on the driver: hash the value. */
function jsonValue(value: unknown): unknown {
  if (typeof value !== 'string') return value ?? null;
  try {
    return JSON.parse(value) as unknown;
  } catch {
    return value;
  }
}

/** What the chain hashes of an entry, exactly as the database holds it now. */
export function contentOf(entry: AuditEntry): ChainEntryContent {
  return {
    id: Number(entry.id),
    occurredAt: entry.occurredAt,
    actorUserId: orNull(entry.actorUserId, Number),
    actorEmail: entry.actorEmail,
    action: entry.action,
    entityType: entry.entityType,
    entityId: entry.entityId,
    before: jsonValue(entry.beforeJson),
    after: jsonValue(entry.afterJson),
    requestId: entry.requestId,
    ip: entry.ip,
  };
}

/** A sealed entry for the verifier; only called on rows read with chain_seq set. */
export function sealedOf(entry: AuditEntry): SealedChainEntry {
  return {
    ...contentOf(entry),
    chainSeq: Number(entry.chainSeq),
    prevHash: entry.prevHash ?? '',
    entryHash: entry.entryHash ?? '',
  };
}
