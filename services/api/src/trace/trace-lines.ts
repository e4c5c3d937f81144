import { Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { SnapshotFigures, TraceTallyLine } from '@tallyloom/core';
import { factColumnsSql, factFromRow, factJoinsSql } from '@tallyloom/reports';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { Actor } from '../common/access/actor';
import { within } from '../common/access/scope';
import { isoTimestamp } from '../common/sql/column-values';
import { MonthlyTally } from '../tallies/models/monthly-tally.model';
import { SCOPE_CHAPTER, tallyScope } from '../tallies/tally-scope';

/** One counted revision with who approved it and every figure it adds. */
export type CountedRevision = Omit<TraceTallyLine, 'value' | 'amendments' | 'receipts'> & {
  figures: SnapshotFigures;
};

/**
 * The figures of named revisions, in the fact columns of reports' chapterMonthFactsSql (read with
 * its factFromRow), so a line adds exactly what the snapshot builder added. The builder's SQL
 * reads the approved revision of each tally; a trace reads the revisions the snapshot names,
 * which differ when an amendment was approved after the snapshot was built.
 */
function countedRevisionsSql(): string {
  return [
    'SELECT t.chapter_id, c.region_id, DATE_FORMAT(t.month, :monthFormat) AS month,',
    '  t.id AS tally_id, r.revision, c.name AS chapter_name, g.name AS region_name,',
    '  u.display_name AS approved_by_name, r.approved_at,',
    factColumnsSql(),
    'FROM tally_revisions r',
    'JOIN monthly_tallies t ON t.id = r.tally_id',
    'JOIN chapters c ON c.id = t.chapter_id',
    'JOIN regions g ON g.id = c.region_id',
    'LEFT JOIN users u ON u.id = r.approved_by',
    factJoinsSql(),
    'WHERE r.tally_id IN (:tallyIds)',
  ].join('\n');
}

/** Reads the revisions a snapshot was built from, as far as they are in the person's scope. */
@Injectable()
export class TraceLines {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(MonthlyTally) private readonly tallies: typeof MonthlyTally,
  ) {}

  /** By month, then chapter name; a revision outside the person's scope is left out. */
  async read(actor: Actor, sources: ReadonlyArray<[number, number]>): Promise<CountedRevision[]> {
    if (sources.length === 0) return [];
    const inScope = await this.tallies.findAll({
      where: within(tallyScope(actor), { id: [...new Set(sources.map(([id]) => id))] }),
      include: [SCOPE_CHAPTER],
      attributes: ['id'],
    });
    if (inScope.length === 0) return [];
    const rows = await this.sequelize.query<Record<string, unknown>>(countedRevisionsSql(), {
      type: QueryTypes.SELECT,
      replacements: { tallyIds: inScope.map((tally) => tally.id), monthFormat: '%Y-%m' },
    });
    const counted = new Set(sources.map(([id, revision]) => `${id}:${revision}`));
    return rows
      .filter((row) => counted.has(`${Number(row.tally_id)}:${Number(row.revision)}`))
      .map((row) => {
        const fact = factFromRow(row);
        return {
          tallyId: fact.tallyId,
          chapterId: fact.chapterId,
          chapterName: String(row.chapter_name),
          regionName: String(row.region_name),
          month: fact.month,
          revision: fact.revision,
          approvedBy: typeof row.approved_by_name === 'string' ? row.approved_by_name : null,
          approvedAt: row.approved_at === null ? null : isoTimestamp(row.approved_at),
          figures: fact.figures,
        };
      })
      .sort((a, b) => a.month.localeCompare(b.month) || a.chapterName.localeCompare(b.chapterName));
  }
}
