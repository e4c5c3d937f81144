/**
 * The SQL that reads the tally snapshot's facts: one row per approved chapter-month. Every
 * snapshot is a roll-up of these rows, so the job reads them once and aggregates in code.
 */
import {
  PEOPLE_GROUPS,
  emptySnapshotFigures,
  type MonthKey,
  type PeopleGroup,
  type SnapshotFigures,
} from '@tallyloom/core';
import { monthStartDate, requireIds, type SqlQuery } from './sql';
import { PEOPLE_GROUP_COLUMNS } from './tally-snapshot';

export interface FactsFilter {
  /** Only these chapters; all when absent. An empty list matches none. */
  chapterIds?: readonly number[];
  /** First month, 'YYYY-MM' (inclusive). */
  from?: MonthKey;
  /** Last month, 'YYYY-MM' (inclusive). */
  to?: MonthKey;
}

function filterClauses(
  filter: FactsFilter,
  tally: string,
): { where: string[]; replacements: Record<string, unknown> } {
  const where: string[] = [];
  const replacements: Record<string, unknown> = {};
  if (filter.chapterIds !== undefined) {
    const ids = requireIds('chapterIds', filter.chapterIds);
    // `IN ()` is not SQL; a list with nothing in it matches nothing.
    if (ids.length === 0) where.push('1 = 0');
    else {
      where.push(`${tally}.chapter_id IN (:chapterIds)`);
      replacements.chapterIds = ids;
    }
  }
  if (filter.from !== undefined) {
    where.push(`${tally}.month >= :fromMonth`);
    replacements.fromMonth = monthStartDate('from', filter.from);
  }
  if (filter.to !== undefined) {
    where.push(`${tally}.month <= :toMonth`);
    replacements.toMonth = monthStartDate('to', filter.to);
  }
  return { where, replacements };
}

/** A line table summed once per revision in a derived table, joined to the revision `r`. */
const lineTotals = (table: string, alias: string, extra = ''): string =>
  `LEFT JOIN (SELECT l.revision_id, SUM(l.count) AS total${extra} FROM ${table} l` +
  ` GROUP BY l.revision_id) ${alias} ON ${alias}.revision_id = r.id`;

const groupColumn = (group: PeopleGroup) => `by_${PEOPLE_GROUP_COLUMNS[group]}`;

/**
 * The derived tables every fact column reads from besides the revision `r`: each line table
 * grouped by revision once (MariaDB splits the grouping per revision when only a few are
 * joined), so a revision with many lines still gives exactly one row, and a full read costs one
 * pass over each line table instead of a sub-select per row and measure.
 */
export function factJoinsSql(): string {
  const byGroup = PEOPLE_GROUPS.map(
    (group) =>
      `, SUM(CASE WHEN l.people_group = '${group}' THEN l.count ELSE 0 END) AS ${groupColumn(group)}`,
  ).join('');
  return [
    lineTotals('tally_blankets_assembled', 'fa'),
    lineTotals('tally_blankets_given', 'fg'),
    lineTotals('tally_people_served', 'fp', byGroup),
  ].join('\n');
}

/**
 * Each flow measure's fact column: [column name, SQL over the revision `r` and the derived
 * tables of `factJoinsSql`]. Stock is not here: it is a level, read from the closing columns.
 */
export function flowColumns(): Array<[string, string]> {
  return [
    ['panels_accepted', 'r.panels_accepted'],
    [
      'panels_set_aside',
      'r.set_aside_off_size + r.set_aside_hard_care + r.set_aside_soiled + r.set_aside_other',
    ],
    ['panels_used', 'r.panels_used'],
    ['blankets_assembled', 'COALESCE(fa.total, 0)'],
    ['blankets_received', 'r.blankets_received'],
    ['blankets_given', 'COALESCE(fg.total, 0)'],
    ['people_served', 'COALESCE(fp.total, 0)'],
    ...PEOPLE_GROUPS.map((group): [string, string] => [
      PEOPLE_GROUP_COLUMNS[group],
      `COALESCE(fp.${groupColumn(group)}, 0)`,
    ]),
    ['volunteer_hours', 'r.volunteer_hours'],
    ['yarn_kg', 'COALESCE(r.yarn_kg, 0)'],
  ];
}

/**
 * Every measure's fact column of the revision aliased `r` and the derived tables of
 * `factJoinsSql`, as `factFromRow` reads them. Shared by the snapshot facts and the trace, so a
 * traced line adds exactly what the snapshot builder added.
 */
export function factColumnsSql(): string {
  return [
    ...flowColumns().map(([column, expression]) => `  ${expression} AS ${column},`),
    '  r.panels_closing, r.blankets_closing',
  ].join('\n');
}

/**
 * One SELECT yielding one row per approved chapter-month: chapter_id, region_id, month
 * ('YYYY-MM'), tally_id, revision and every measure's fact column (see `factJoinsSql`).
 */
export function chapterMonthFactsSql(filter: FactsFilter = {}): SqlQuery {
  const { where, replacements } = filterClauses(filter, 't');
  const sql = [
    'SELECT t.chapter_id, c.region_id, DATE_FORMAT(t.month, :monthFormat) AS month,',
    '  t.id AS tally_id, r.revision,',
    factColumnsSql(),
    'FROM monthly_tallies t',
    'JOIN chapters c ON c.id = t.chapter_id',
    // The approved revision only: an amendment in progress leaves it in force.
    'JOIN tally_revisions r ON r.tally_id = t.id AND r.revision = t.approved_revision',
    factJoinsSql(),
    `WHERE ${['t.approved_revision IS NOT NULL', ...where].join(' AND ')}`,
    'ORDER BY t.chapter_id, t.month',
  ].join('\n');
  return { sql, replacements: { ...replacements, monthFormat: '%Y-%m' } };
}

/** One approved chapter-month with its figures (peopleServedByGroup and stocks included). */
export interface ChapterMonthFact {
  chapterId: number;
  regionId: number;
  month: MonthKey;
  tallyId: number;
  revision: number;
  figures: SnapshotFigures;
}

/** A row as the driver returns it: counts may come as numbers or text, decimals as text. */
export type FactRow = Record<string, unknown>;

function numberOf(row: FactRow, column: string): number {
  const value = Number(row[column] ?? 0);
  if (!Number.isFinite(value)) {
    throw new RangeError(`Fact column ${column} is not a number: ${JSON.stringify(row[column])}.`);
  }
  return value;
}

/**
 * The flow figures of a row with `flowColumns` (a chapter-month, or their sum), with
 * `approvedTallies` from its column when summed, else 1; stock from the closing columns if any.
 */
export function figuresFromRow(row: FactRow): SnapshotFigures {
  const byGroup = Object.fromEntries(
    PEOPLE_GROUPS.map((group) => [group, numberOf(row, PEOPLE_GROUP_COLUMNS[group])]),
  ) as Record<PeopleGroup, number>;
  return {
    ...emptySnapshotFigures(),
    panelsAccepted: numberOf(row, 'panels_accepted'),
    panelsSetAside: numberOf(row, 'panels_set_aside'),
    panelsUsed: numberOf(row, 'panels_used'),
    blanketsAssembled: numberOf(row, 'blankets_assembled'),
    blanketsReceived: numberOf(row, 'blankets_received'),
    blanketsGiven: numberOf(row, 'blankets_given'),
    peopleServed: numberOf(row, 'people_served'),
    peopleServedByGroup: byGroup,
    volunteerHours: numberOf(row, 'volunteer_hours'),
    yarnKg: numberOf(row, 'yarn_kg'),
    panelsInStock: numberOf(row, 'panels_closing'),
    blanketsInStock: numberOf(row, 'blankets_closing'),
    approvedTallies: 'approved_tallies' in row ? numberOf(row, 'approved_tallies') : 1,
  };
}

/** Reads a row of `chapterMonthFactsSql` into a fact (one approved tally). */
export function factFromRow(row: FactRow): ChapterMonthFact {
  return {
    chapterId: numberOf(row, 'chapter_id'),
    regionId: numberOf(row, 'region_id'),
    month: String(row.month),
    tallyId: numberOf(row, 'tally_id'),
    revision: numberOf(row, 'revision'),
    figures: figuresFromRow(row),
  };
}

/**
 * One SELECT yielding the flows of each region and month, summed in SQL over the same approved
 * revisions and fact columns as `chapterMonthFactsSql`: a full rebuild needs chapters only for
 * stock, compliance and sources (see `tallyStatusSql`), so it lets the database add the flows.
 */
export function regionMonthFlowsSql(filter: FactsFilter = {}): SqlQuery {
  const { where, replacements } = filterClauses(filter, 't');
  const sql = [
    'SELECT c.region_id, DATE_FORMAT(t.month, :monthFormat) AS month,',
    ...flowColumns().map(([column, expression]) => `  SUM(${expression}) AS ${column},`),
    '  COUNT(*) AS approved_tallies',
    'FROM monthly_tallies t',
    'JOIN chapters c ON c.id = t.chapter_id',
    'JOIN tally_revisions r ON r.tally_id = t.id AND r.revision = t.approved_revision',
    factJoinsSql(),
    `WHERE ${['t.approved_revision IS NOT NULL', ...where].join(' AND ')}`,
    'GROUP BY c.region_id, t.month',
  ].join('\n');
  return { sql, replacements: { ...replacements, monthFormat: '%Y-%m' } };
}

/** The flows of one region (chapterId null) or one chapter in one month. */
export interface MonthFlows {
  chapterId: number | null;
  regionId: number;
  month: MonthKey;
  /** Flows only: stock comes from each chapter's approved closing (TallyStatus.approved). */
  figures: SnapshotFigures;
}

/** Reads a row of `regionMonthFlowsSql`. */
export function regionMonthFlowsFromRow(row: FactRow): MonthFlows {
  return {
    chapterId: null,
    regionId: numberOf(row, 'region_id'),
    month: String(row.month),
    figures: figuresFromRow(row),
  };
}
