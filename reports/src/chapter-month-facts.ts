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
 * Every measure's fact column of the revision aliased `r` and the derived tables of
 * `factJoinsSql`, as `factFromRow` reads them. Shared by the snapshot facts and the trace, so a
 * traced line adds exactly what the snapshot builder added.
 */
export function factColumnsSql(): string {
  const people = PEOPLE_GROUPS.map(
    (group) => `COALESCE(fp.${groupColumn(group)}, 0) AS ${PEOPLE_GROUP_COLUMNS[group]}`,
  );
  return [
    '  r.panels_accepted,',
    '  r.set_aside_off_size + r.set_aside_hard_care + r.set_aside_soiled + r.set_aside_other AS panels_set_aside,',
    '  r.panels_used,',
    '  COALESCE(fa.total, 0) AS blankets_assembled,',
    '  r.blankets_received,',
    '  COALESCE(fg.total, 0) AS blankets_given,',
    '  COALESCE(fp.total, 0) AS people_served,',
    ...people.map((column) => `  ${column},`),
    '  r.volunteer_hours,',
    '  COALESCE(r.yarn_kg, 0) AS yarn_kg,',
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

/** Reads a row of `chapterMonthFactsSql` into a fact (one approved tally). */
export function factFromRow(row: FactRow): ChapterMonthFact {
  const byGroup = Object.fromEntries(
    PEOPLE_GROUPS.map((group) => [group, numberOf(row, PEOPLE_GROUP_COLUMNS[group])]),
  ) as Record<PeopleGroup, number>;
  return {
    chapterId: numberOf(row, 'chapter_id'),
    regionId: numberOf(row, 'region_id'),
    month: String(row.month),
    tallyId: numberOf(row, 'tally_id'),
    revision: numberOf(row, 'revision'),
    figures: {
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
      approvedTallies: 1,
    },
  };
}
