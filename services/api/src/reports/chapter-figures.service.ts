import { Injectable } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import type { Period } from '@tallyloom/core';
import {
  chapterMonthFactsSql,
  chaptersSql,
  factFromRow,
  flowsOfFacts,
  monthRangeOf,
  rollUpSnapshots,
  tallyStatusSql,
  type BuiltSnapshot,
  type SnapshotTarget,
  type SqlQuery,
} from '@tallyloom/reports';
import { QueryTypes, Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { chapterInfoFromRow, tallyStatusFromRow } from './snapshot-inputs';

/**
 * Chapters' snapshot figures, built when asked from their approved tallies with the same
 * roll-up as the stored region and network rows. A chapter has at most a few hundred tallies,
 * so reading them live costs less than keeping a row per chapter and period current — and the
 * figures are as of now, not as of the last rebuild.
 */
@Injectable()
export class ChapterFigures {
  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  /** One snapshot per chapter × period, in that order; unknown chapters give none. */
  async build(chapterIds: readonly number[], periods: readonly Period[]): Promise<BuiltSnapshot[]> {
    if (chapterIds.length === 0 || periods.length === 0) return [];
    const targets: SnapshotTarget[] = chapterIds.flatMap((scopeId) =>
      periods.map((period) => ({ scope: 'chapter' as const, scopeId, period })),
    );
    const filter = { chapterIds: [...chapterIds], ...monthRangeOf(targets)! };
    // One consistent read: facts and statuses from the same moment.
    return this.sequelize.transaction(
      { isolationLevel: Transaction.ISOLATION_LEVELS.REPEATABLE_READ },
      async (transaction) => {
        const select = (query: SqlQuery) =>
          this.sequelize.query<Record<string, unknown>>(query.sql, {
            type: QueryTypes.SELECT,
            replacements: query.replacements,
            transaction,
          });
        const chapters = (await select(chaptersSql({ chapterIds: filter.chapterIds }))).map(
          chapterInfoFromRow,
        );
        const facts = (await select(chapterMonthFactsSql(filter))).map(factFromRow);
        const statuses = (await select(tallyStatusSql(filter))).map(tallyStatusFromRow);
        const known = new Set(chapters.map((chapter) => chapter.chapterId));
        const today = new Date().toISOString().slice(0, 10);
        // The statuses carry each tally's approved revision and closing stock already.
        return rollUpSnapshots(
          { flows: flowsOfFacts(facts), chapters, statuses, today },
          targets.filter((target) => known.has(target.scopeId)),
        );
      },
    );
  }
}
