import { Injectable, Logger } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { GENESIS_HEAD, sealAfter, type ChainHead } from '@tallyloom/core';
import { Op, QueryTypes, Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { contentOf } from './audit-entry-content';
import { AuditEntry } from './models/audit-entry.model';
import { sha256Hex } from './sha256';

const LOCK_NAME = 'tallyloom.audit-chain';
/** Entries sealed per transaction: short transactions, memory bounded by the batch. */
export const SEAL_BATCH = 500;

/**
 * Puts unsealed audit entries on the hash chain, oldest id first.
 *
 * Writers insert entries unsealed inside their own transactions and never touch the chain head:
 * locking one head row in every write would serialise all writes and add a lock that every
 * transaction takes in a different order (deadlocks). Instead one sealer at a time, under a
 * named database lock, reads the head and the committed unsealed entries and numbers them on.
 * Chain order is therefore sealing order: an entry whose transaction commits late is sealed
 * after later ids, which is fine, because the chain proves what was recorded, not when.
 */
@Injectable()
export class AuditChainSealer {
  private readonly logger = new Logger('AuditChain');

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(AuditEntry) private readonly entries: typeof AuditEntry,
  ) {}

  /**
   * Seals every entry committed before the lock was won; returns how many. `waitSeconds` is how
   * long to wait for another sealer; null when it held the lock longer (its run seals them).
   */
  async sealPending(waitSeconds = 30): Promise<number | null> {
    return this.sequelize.transaction(async (lockHolder) => {
      const [{ got }] = await this.sequelize.query<{ got: number | null }>(
        'SELECT GET_LOCK(:name, :wait) AS got',
        {
          type: QueryTypes.SELECT,
          replacements: { name: LOCK_NAME, wait: waitSeconds },
          transaction: lockHolder,
        },
      );
      if (Number(got) !== 1) return null;
      try {
        let total = 0;
        for (;;) {
          const sealed = await this.sealBatch();
          total += sealed;
          if (sealed < SEAL_BATCH) break;
        }
        if (total > 0) this.logger.log(`sealed ${total} audit entries`);
        return total;
      } finally {
        // Released after the batches committed: the next sealer reads the head they wrote.
        await this.sequelize.query('SELECT RELEASE_LOCK(:name)', {
          type: QueryTypes.SELECT,
          replacements: { name: LOCK_NAME },
          transaction: lockHolder,
        });
      }
    });
  }

  /** The last sealed entry, or the genesis head for an empty chain. */
  async head(transaction?: Transaction): Promise<ChainHead> {
    const last = await this.entries.findOne({
      attributes: ['chainSeq', 'entryHash'],
      where: { chainSeq: { [Op.ne]: null } },
      order: [['chainSeq', 'DESC']],
      transaction,
    });
    return last ? { chainSeq: Number(last.chainSeq), entryHash: last.entryHash! } : GENESIS_HEAD;
  }

  private sealBatch(): Promise<number> {
    // READ COMMITTED: no gap locks that would hold up writers inserting new entries meanwhile.
    return this.sequelize.transaction(
      { isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED },
      async (transaction) => {
        const head = await this.head(transaction);
        const pending = await this.entries.findAll({
          where: { chainSeq: null },
          order: [['id', 'ASC']],
          limit: SEAL_BATCH,
          transaction,
        });
        const sealed = sealAfter(head, pending.map(contentOf), sha256Hex);
        for (const entry of sealed) {
          // Only an unsealed row: a seal is written once, and the account may write nothing else.
          const [, affected] = await this.sequelize.query(
            `UPDATE audit_entries SET chain_seq = :chainSeq, prev_hash = :prevHash,
                    entry_hash = :entryHash
              WHERE id = :id AND chain_seq IS NULL`,
            {
              type: QueryTypes.UPDATE,
              replacements: {
                id: entry.id,
                chainSeq: entry.chainSeq,
                prevHash: entry.prevHash,
                entryHash: entry.entryHash,
              },
              transaction,
            },
          );
          if (affected !== 1) throw new Error(`audit entry ${entry.id} was sealed by another run`);
        }
        return sealed.length;
      },
    );
  }
}
