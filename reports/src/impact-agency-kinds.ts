/**
 * The impact pack's "by partner-agency kind" table: blankets given and people served per kind of
 * partner agency, from approved tally revisions only (the rule of the tally snapshot).
 */
import { AGENCY_KINDS, AGENCY_KIND_LABELS, type AgencyKind } from '@tallyloom/core';
import { monthStartDate, requireIds, type SqlQuery } from './sql';

export interface AgencyKindFilter {
  /** The chapters of the pack's scope. An empty list matches none. */
  chapterIds: readonly number[];
  /** First month, 'YYYY-MM' (inclusive). */
  from: string;
  /** Last month, 'YYYY-MM' (inclusive). */
  to: string;
}

/** One line table summed per agency kind over the approved revisions in scope and period. */
function kindBranch(table: string, given: string, served: string, chapters: string): string {
  return [
    `SELECT a.kind, ${given} AS blankets_given, ${served} AS people_served`,
    `FROM ${table} l`,
    'JOIN partner_agencies a ON a.id = l.partner_agency_id',
    'JOIN tally_revisions r ON r.id = l.revision_id',
    // The approved revision only: an amendment in progress leaves it in force.
    'JOIN monthly_tallies t ON t.id = r.tally_id AND t.approved_revision = r.revision',
    `WHERE ${chapters} AND t.month >= :fromMonth AND t.month <= :toMonth`,
    'GROUP BY a.kind',
  ].join('\n');
}

/**
 * One row per agency kind with lines: kind, blankets_given, people_served. The two line tables
 * are summed in separate branches of a UNION, so blanket lines never multiply people lines.
 */
export function agencyKindFiguresSql(filter: AgencyKindFilter): SqlQuery {
  const ids = requireIds('chapterIds', filter.chapterIds);
  // `IN ()` is not SQL; a list with nothing in it matches nothing.
  const chapters = ids.length > 0 ? 't.chapter_id IN (:chapterIds)' : '1 = 0';
  const sql = [
    'SELECT x.kind, SUM(x.blankets_given) AS blankets_given, SUM(x.people_served) AS people_served',
    'FROM (',
    kindBranch('tally_blankets_given', 'SUM(l.count)', '0', chapters),
    'UNION ALL',
    kindBranch('tally_people_served', '0', 'SUM(l.count)', chapters),
    ') x',
    'GROUP BY x.kind',
  ].join('\n');
  return {
    sql,
    replacements: {
      fromMonth: monthStartDate('from', filter.from),
      toMonth: monthStartDate('to', filter.to),
      ...(ids.length > 0 ? { chapterIds: ids } : {}),
    },
  };
}

export interface AgencyKindRow {
  kind: AgencyKind;
  label: string;
  blanketsGiven: number;
  peopleServed: number;
}

/** Every agency kind in the catalogue order, zero where no line names it. */
export function agencyKindRows(rows: ReadonlyArray<Record<string, unknown>>): AgencyKindRow[] {
  const byKind = new Map(rows.map((row) => [String(row.kind), row]));
  return AGENCY_KINDS.map((kind) => {
    const row = byKind.get(kind);
    return {
      kind,
      label: AGENCY_KIND_LABELS[kind],
      blanketsGiven: Number(row?.blankets_given ?? 0),
      peopleServed: Number(row?.people_served ?? 0),
    };
  });
}
