import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import type { RequestContext } from '../common/context/request-context';
import { AuditChainScheduler } from './audit-chain.scheduler';
import { AuditEntry } from './models/audit-entry.model';

export interface AuditRecord {
  /** Dotted verb, e.g. "user.invited", "auth.sign_in_failed". */
  action: string;
  entityType: string;
  entityId?: string | number | null;
  before?: Record<string, unknown> | null;
  after?: Record<string, unknown> | null;
  /** For events without a signed-in actor (a failed sign-in): who it concerned. */
  actorEmail?: string | null;
}

@Injectable()
export class AuditService {
  constructor(
    @InjectModel(AuditEntry) private readonly entries: typeof AuditEntry,
    private readonly chain: AuditChainScheduler,
  ) {}

  /**
   * Writes one entry inside the caller's transaction, so the change and its record stand or fall
   * together. The entry is written unsealed; a seal is queued once the transaction commits.
   */
  async record(
    context: RequestContext,
    record: AuditRecord,
    transaction?: Transaction,
  ): Promise<void> {
    await this.entries.create(
      {
        occurredAt: new Date(),
        actorUserId: context.actor?.id ?? null,
        actorEmail: context.actor?.email ?? record.actorEmail ?? null,
        action: record.action,
        entityType: record.entityType,
        entityId: record.entityId == null ? null : String(record.entityId),
        beforeJson: record.before ?? null,
        afterJson: record.after ?? null,
        requestId: context.requestId,
        ip: context.ip,
      },
      { transaction },
    );
    if (transaction) transaction.afterCommit(() => this.chain.sealSoon());
    else this.chain.sealSoon();
  }

  /**
   * For updates: records the entry only when `before` and `after` differ, so an edit that
   * changes nothing leaves no trace. Returns whether an entry was written.
   */
  async recordChange(
    context: RequestContext,
    record: AuditRecord & { before: Record<string, unknown>; after: Record<string, unknown> },
    transaction?: Transaction,
  ): Promise<boolean> {
    if (JSON.stringify(record.before) === JSON.stringify(record.after)) return false;
    await this.record(context, record, transaction);
    return true;
  }
}
