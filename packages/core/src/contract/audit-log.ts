/** The audit log as readers see it: entries, filters, and the hash chain's verification (issue #8). */
import type { ChainBreak } from '../audit/hash-chain';
import type { Page } from './users';

/** One audit entry as GET /api/audit-log shows it. */
export interface AuditLogEntryView {
  id: number;
  /** ISO instant. */
  occurredAt: string;
  actorUserId: number | null;
  actorEmail: string | null;
  /** Dotted verb, e.g. 'tally.approved'. */
  action: string;
  entityType: string;
  entityId: string | null;
  before: unknown;
  after: unknown;
  requestId: string | null;
  ip: string | null;
  /** False until the sealer has put the entry on the chain (seconds after it is written). */
  sealed: boolean;
  /** Place in the hash chain; null until sealed. */
  chainSeq: number | null;
  /** Hex SHA-256 of the entry; null until sealed. */
  entryHash: string | null;
}

/** GET /api/audit-log?…, newest first. Every filter is optional; dates are inclusive UTC days. */
export interface AuditLogListParams {
  page?: number;
  pageSize?: number;
  /** An actor's e-mail (part of it matches) or user id (a whole number). */
  who?: string;
  /** An action, or the start of one ('tally.' matches every tally action). */
  what?: string;
  entityType?: string;
  entityId?: string;
  /** 'YYYY-MM-DD', on or after. */
  from?: string;
  /** 'YYYY-MM-DD', on or before. */
  to?: string;
}

export type AuditLogPage = Page<AuditLogEntryView>;

/** The first place the chain stops holding, in plain words. */
export type ChainBreakView = ChainBreak;

/** POST /api/audit-log/verify, and the nightly job's result. */
export interface AuditVerificationView {
  ok: boolean;
  /** Sealed entries recomputed (up to and including a broken one). */
  entriesChecked: number;
  firstBrokenLink: ChainBreakView | null;
  /** ISO instant. */
  verifiedAt: string;
  /** The last chain position checked; 0 for an empty log. */
  headChainSeq: number;
  /** Entries the verification sealed first (written since the last seal). */
  sealedBeforeCheck: number;
}
