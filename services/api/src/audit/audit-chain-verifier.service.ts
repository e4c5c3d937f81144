import { Injectable, Logger, ServiceUnavailableException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { ChainVerifier, type AuditVerificationView, type ChainHead } from '@tallyloom/core';
import { Op } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { RequestContext } from '../common/context/request-context';
import { AuditChainSealer } from './audit-chain-sealer.service';
import { sealedOf } from './audit-entry-content';
import { AuditService } from './audit.service';
import { AuditEntry } from './models/audit-entry.model';
import { AuditVerification, type VerificationSource } from './models/audit-verification.model';
import { sha256Hex } from './sha256';

/** Entries read per page while walking the chain: memory stays flat whatever the log's size. */
export const VERIFY_PAGE = 1000;

export const AUDIT_LOG_ENTITY = 'audit_log';

/**
 * Seals what is pending, then recomputes every sealed entry in chain order (keyset on chain_seq)
 * and records the run, with its audit entry, in one transaction.
 */
@Injectable()
export class AuditChainVerifier {
  private readonly logger = new Logger('AuditChain');

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(AuditEntry) private readonly entries: typeof AuditEntry,
    @InjectModel(AuditVerification) private readonly runs: typeof AuditVerification,
    private readonly sealer: AuditChainSealer,
    private readonly audit: AuditService,
  ) {}

  async verify(
    context: RequestContext,
    source: VerificationSource,
  ): Promise<AuditVerificationView> {
    const sealedBeforeCheck = await this.sealer.sealPending();
    if (sealedBeforeCheck === null) {
      throw new ServiceUnavailableException(
        'The audit log is being sealed by another run; try the verification again in a minute.',
      );
    }
    // Entries sealed after this point are left to the next run, so the walk has an end.
    const end = await this.sealer.head();
    const verifier = new ChainVerifier(sha256Hex, await this.anchor());
    let after = 0;
    for (;;) {
      const page = await this.entries.findAll({
        where: { chainSeq: { [Op.gt]: after, [Op.lte]: end.chainSeq } },
        order: [['chainSeq', 'ASC']],
        limit: VERIFY_PAGE,
      });
      if (page.length === 0 || verifier.check(page.map(sealedOf))) break;
      after = Number(page[page.length - 1].chainSeq);
      if (page.length < VERIFY_PAGE) break;
    }
    const broken = verifier.finish();
    const verifiedAt = new Date();
    const view: AuditVerificationView = {
      ok: broken === null,
      entriesChecked: verifier.entriesChecked,
      firstBrokenLink: broken,
      verifiedAt: verifiedAt.toISOString(),
      headChainSeq: verifier.head.chainSeq,
      sealedBeforeCheck,
    };
    await this.record(context, source, verifiedAt, view, verifier.head);
    if (broken) this.logger.error(`audit chain broken: ${broken.message}`);
    return view;
  }

  /** The furthest head a run that held has seen: the chain may not end before it. */
  private async anchor(): Promise<ChainHead | null> {
    const last = await this.runs.findOne({
      where: { ok: true },
      order: [['headChainSeq', 'DESC']],
    });
    return last ? { chainSeq: Number(last.headChainSeq), entryHash: last.headHash } : null;
  }

  private async record(
    context: RequestContext,
    source: VerificationSource,
    verifiedAt: Date,
    view: AuditVerificationView,
    head: ChainHead,
  ): Promise<void> {
    const broken = view.firstBrokenLink;
    await this.sequelize.transaction(async (transaction) => {
      const run = await this.runs.create(
        {
          verifiedBy: context.actor?.id ?? null,
          source,
          verifiedAt,
          ok: view.ok,
          entriesChecked: view.entriesChecked,
          headChainSeq: head.chainSeq,
          headHash: head.entryHash,
          brokenChainSeq: broken?.chainSeq ?? null,
          brokenEntryId: broken?.entryId ?? null,
          brokenReason: broken?.reason ?? null,
          brokenMessage: broken?.message.slice(0, 500) ?? null,
        },
        { transaction },
      );
      await this.audit.record(
        context,
        {
          action: 'audit_log.verified',
          entityType: AUDIT_LOG_ENTITY,
          entityId: run.id,
          after: {
            source,
            ok: view.ok,
            entriesChecked: view.entriesChecked,
            headChainSeq: head.chainSeq,
            firstBrokenLink: broken,
          },
        },
        transaction,
      );
    });
  }
}
