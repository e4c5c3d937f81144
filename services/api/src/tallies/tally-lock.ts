import { ConflictException, Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { transitionRefusal, type TallyAction } from '@tallyloom/core';
import { Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { SignedInContext } from '../common/context/request-context';
import { MonthlyTally } from './models/monthly-tally.model';
import { TallyRevision } from './models/tally-revision.model';
import { StaleTallyException } from './stale-tally.exception';
import { tallyNotFound } from './tally-in-scope.guard';
import { TallyReader } from './tally-reader.service';
import { TallyRevisionsRepository } from './tally-revisions.repository';

/** What a locked write sees: the tally row (locked) and its current revision. */
export interface LockedTally {
  tally: MonthlyTally;
  current: TallyRevision;
  transaction: Transaction;
}

export interface LockedWrite {
  /** The version the client read. */
  version: number;
  /** The step of the flow this write is; refused (409) when the state does not allow it. */
  action: TallyAction;
  /**
   * Checked before the version: true when this request repeats one already done (the same
   * idempotency key), so it answers as the first did and changes nothing.
   */
  isRepeat?: (locked: LockedTally) => Promise<boolean>;
  /**
   * The change itself. Returns the tally's own columns to change, or null when nothing changed
   * (then the version stays, so an autosave of the same figures is free).
   */
  apply: (locked: LockedTally) => Promise<Partial<MonthlyTally> | null>;
}

/**
 * Read committed: the tally row's lock already orders writers of one tally, and without the gap
 * locks of repeatable read, writers of different tallies replacing their lines (delete, then
 * insert) no longer deadlock each other.
 */
export const TALLY_WRITE = {
  isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED,
};

/** Thrown inside the transaction so it rolls back; answered outside with the tally as it is now. */
class Stale extends Error {}

/**
 * Every write to a tally goes through here: one transaction, the tally row locked with
 * SELECT … FOR UPDATE, the version compared inside the lock (a stale write answers 409 with the
 * current tally), the flow's state rule, the change, and version + 1 — all or nothing.
 */
@Injectable()
export class TallyLock {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(MonthlyTally) private readonly tallies: typeof MonthlyTally,
    private readonly revisions: TallyRevisionsRepository,
    private readonly reader: TallyReader,
  ) {}

  async write(context: SignedInContext, id: number, write: LockedWrite): Promise<void> {
    // Scope first, outside the lock: a tally the person cannot see is simply not found.
    await this.reader.findInScope(context.actor, id);
    try {
      await this.sequelize.transaction(TALLY_WRITE, async (transaction) => {
        const tally = await this.tallies.findOne({
          where: { id },
          transaction,
          lock: transaction.LOCK.UPDATE,
        });
        if (!tally) throw tallyNotFound();
        const current = await this.revisions.find(tally.id, tally.currentRevision, transaction);
        if (!current) throw new Error(`tally ${id} has no revision ${tally.currentRevision}`);
        const locked = { tally, current, transaction };
        if (write.isRepeat && (await write.isRepeat(locked))) return;
        if (tally.version !== write.version) throw new Stale();
        const refusal = transitionRefusal(tally.state, write.action);
        if (refusal) throw new ConflictException(refusal);
        const changes = await write.apply(locked);
        if (changes)
          await tally.update({ ...changes, version: tally.version + 1 }, { transaction });
      });
    } catch (error) {
      if (error instanceof Stale)
        throw new StaleTallyException(await this.reader.detail(context.actor, id));
      throw error;
    }
  }
}
