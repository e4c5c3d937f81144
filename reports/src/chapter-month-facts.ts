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

/** A line table summed per revision in a correlated sub-select: one value per row, no fan-out. */
const lineSum = (table: string, condition = ''): string =>
  `(SELECT COALESCE(SUM(l.count), 0) FROM ${table} l WHERE l.revision_id = r.id${condition})`;

/**
 * Every measure's fact column of the revision aliased `r` (line tables summed in sub-selects),
 * as `factFromRow` reads them. Shared by the snapshot facts and the trace, so a traced line adds
 * exactly what the snapshot builder added.
 */
export function factColumnsSql(): string {
  const people = PEOPLE_GROUPS.map(
    (group) =>
      `${lineSum('tally_people_served', ` AND l.people_group = '${group}'`)} AS ${PEOPLE_GROUP_COLUMNS[group]}`,
  );
  return [
    '  r.panels_accepted,',
    '  r.set_aside_off_size + r.set_aside_hard_care + r.set_aside_soiled + r.set_aside_other AS panels_set_aside,',
    '  r.panels_used,',
    `  ${lineSum('tally_blankets_assembled')} AS blankets_assembled,`,
    '  r.blankets_received,',
    `  ${lineSum('tally_blankets_given')} AS blankets_given,`,
    `  ${lineSum('tally_people_served')} AS people_served,`,
    ...people.map((column) => `  ${column},`),
    '  r.volunteer_hours,',
    '  COALESCE(r.yarn_kg, 0) AS yarn_kg,',
    '  r.panels_closing, r.blankets_closing',
  ].join('\n');
}

/**
 * One SELECT yielding one row per approved chapter-month: chapter_id, region_id, month
 * ('YYYY-MM'), tally_id, revision and every measure's fact column. Line tables are summed in
 * sub-selects, so a revision with many lines still gives exactly one row.
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
