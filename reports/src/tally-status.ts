/**
 * What the snapshot shows beside its figures: which chapter-months were expected, which were
 * filed when (compliance), and which are pending (filed but not approved, see TALLY_SNAPSHOT).
 */
import type { Period } from '@tallyloom/core';
import { factJoinsSql, flowColumns } from './chapter-month-facts';
import { monthStartDate, requireIds, type SqlQuery } from './sql';
import { PENDING_TALLY_CONDITION } from './tally-snapshot';

export interface ChapterFilter {
  /** Only these chapters; all when absent. An empty list matches none. */
  chapterIds?: readonly number[];
}

export interface ChapterInfoFilter extends ChapterFilter {
  /** Only the chapters of these regions; all when absent. An empty list matches none. */
  regionIds?: readonly number[];
  /** Only the chapters in the same region as this one (itself included). */
  regionOfChapterId?: number;
}

/** Every chapter with what compliance needs: region, due day and active months. */
export function chaptersSql(filter: ChapterInfoFilter = {}): SqlQuery {
  const replacements: Record<string, unknown> = { dayFormat: '%Y-%m-%d' };
  const conditions: string[] = [];
  if (filter.chapterIds !== undefined) {
    const ids = requireIds('chapterIds', filter.chapterIds);
    conditions.push(ids.length === 0 ? '1 = 0' : 'c.id IN (:chapterIds)');
    replacements.chapterIds = ids;
  }
  if (filter.regionIds !== undefined) {
    const ids = requireIds('regionIds', filter.regionIds);
    conditions.push(ids.length === 0 ? '1 = 0' : 'c.region_id IN (:regionIds)');
    replacements.regionIds = ids;
  }
  if (filter.regionOfChapterId !== undefined) {
    const [id] = requireIds('regionOfChapterId', [filter.regionOfChapterId]);
    conditions.push('c.region_id = (SELECT o.region_id FROM chapters o WHERE o.id = :regionOf)');
    replacements.regionOf = id;
  }
  const where = conditions.length > 0 ? `WHERE ${conditions.join(' AND ')}` : '';
  return {
    sql: [
      'SELECT c.id AS chapter_id, c.region_id, c.reporting_due_day,',
      '  DATE_FORMAT(c.active_from, :dayFormat) AS active_from,',
      '  DATE_FORMAT(c.active_to, :dayFormat) AS active_to',
      'FROM chapters c',
      where,
      'ORDER BY c.id',
    ].join('\n'),
    replacements,
  };
}

export interface TallyStatusFilter extends ChapterFilter {
  from?: string;
  to?: string;
}

/**
 * One row per monthly tally in any state: chapter_id, month ('YYYY-MM'), first_submitted_at
 * (for on time / late), pending (1 when filed but its figures are not approved), and when it has
 * an approved revision: tally_id, approved_revision and that revision's closing stocks; and with
 * `withFlows`, its flow columns as `figuresFromRow` reads them.
 */
export function tallyStatusSql(
  filter: TallyStatusFilter = {},
  { withFlows = false }: { withFlows?: boolean } = {},
): SqlQuery {
  const where: string[] = [];
  const replacements: Record<string, unknown> = {
    monthFormat: '%Y-%m',
    timeFormat: '%Y-%m-%d %H:%i:%s',
  };
  if (filter.chapterIds !== undefined) {
    const ids = requireIds('chapterIds', filter.chapterIds);
    where.push(ids.length === 0 ? '1 = 0' : 't.chapter_id IN (:chapterIds)');
    replacements.chapterIds = ids;
  }
  if (filter.from !== undefined) {
    where.push('t.month >= :fromMonth');
    replacements.fromMonth = monthStartDate('from', filter.from);
  }
  if (filter.to !== undefined) {
    where.push('t.month <= :toMonth');
    replacements.toMonth = monthStartDate('to', filter.to);
  }
  return {
    sql: [
      // Timestamps as text ('YYYY-MM-DD HH:MM:SS', the connection's UTC), so every reader
      // gets the same value whatever its driver's date decoding.
      'SELECT t.chapter_id, DATE_FORMAT(t.month, :monthFormat) AS month,',
      '  DATE_FORMAT(t.first_submitted_at, :timeFormat) AS first_submitted_at,',
      `  CASE WHEN ${PENDING_TALLY_CONDITION} THEN 1 ELSE 0 END AS pending,`,
      // The approved revision's closing stock and identity: a period's stock is each chapter's
      // closing in its last approved month, and a snapshot names the revisions it counts.
      '  t.id AS tally_id, t.approved_revision, r.panels_closing, r.blankets_closing',
      // With flows: the approved revision's flow columns too (NULL without one), so one
      // statement gives an incremental rebuild a month's statuses and figures.
      ...(withFlows
        ? flowColumns().map(([column, expression]) => `  , ${expression} AS ${column}`)
        : []),
      'FROM monthly_tallies t',
      'LEFT JOIN tally_revisions r ON r.tally_id = t.id AND r.revision = t.approved_revision',
      withFlows ? factJoinsSql() : '',
      where.length > 0 ? `WHERE ${where.join(' AND ')}` : '',
      'ORDER BY t.chapter_id, t.month',
    ].join('\n'),
    replacements,
  };
}

/** One period's stock: the sum of each chapter's closing stocks of its last approved month. */
export interface PeriodStock {
  panels: number;
  blankets: number;
}

/**
 * The stock of each period for these chapters, summed by the database: each chapter's closing
 * stocks of its last approved month in the period (what `SnapshotRollup` adds from statuses).
 * One row per period with an approved tally: period_index (the position in `periods`),
 * panels_closing, blankets_closing. An incremental rebuild asks it for a quarter and a fiscal
 * year instead of reading every tally of the year: the index on (chapter, month, approved
 * revision) answers the window without touching the tallies themselves.
 */
export function periodStockSql(filter: {
  chapterIds: readonly number[];
  periods: ReadonlyArray<Pick<Period, 'from' | 'to'>>;
}): SqlQuery {
  const ids = requireIds('chapterIds', filter.chapterIds);
  if (ids.length === 0 || filter.periods.length === 0) {
    return {
      sql: 'SELECT 0 AS period_index, 0 AS panels_closing, 0 AS blankets_closing FROM DUAL WHERE 1 = 0',
      replacements: {},
    };
  }
  const replacements: Record<string, unknown> = { chapterIds: ids };
  const lasts = filter.periods.map((period, index) => {
    replacements[`from${index}`] = monthStartDate(`periods[${index}].from`, period.from);
    replacements[`to${index}`] = monthStartDate(`periods[${index}].to`, period.to);
    return [
      `SELECT ${index} AS period_index, t.id, t.approved_revision,`,
      '  ROW_NUMBER() OVER (PARTITION BY t.chapter_id ORDER BY t.month DESC) AS nth',
      'FROM monthly_tallies t',
      `WHERE t.chapter_id IN (:chapterIds) AND t.month BETWEEN :from${index} AND :to${index}`,
      '  AND t.approved_revision IS NOT NULL',
    ].join('\n');
  });
  return {
    sql: [
      'SELECT l.period_index, SUM(r.panels_closing) AS panels_closing,',
      '  SUM(r.blankets_closing) AS blankets_closing',
      `FROM (${lasts.join('\nUNION ALL\n')}) l`,
      'JOIN tally_revisions r ON r.tally_id = l.id AND r.revision = l.approved_revision',
      'WHERE l.nth = 1',
      'GROUP BY l.period_index',
    ].join('\n'),
    replacements,
  };
}

/** Reads the rows of `periodStockSql`: one stock per period, in the order asked (0 without rows). */
export function periodStocksFromRows(
  rows: ReadonlyArray<Record<string, unknown>>,
  periods: number,
): PeriodStock[] {
  const stocks = Array.from({ length: periods }, () => ({ panels: 0, blankets: 0 }));
  for (const row of rows) {
    const stock = stocks[Number(row.period_index)];
    stock.panels = Number(row.panels_closing);
    stock.blankets = Number(row.blankets_closing);
  }
  return stocks;
}
