import {
  addCompliance,
  combineMonthsInto,
  emptyCompliance,
  monthsOf,
  type Period,
  type SnapshotScope,
  type SnapshotView,
} from '@tallyloom/core';
import type { SnapshotRow } from './snapshot-rows';

/** Whose snapshot it is. */
export interface SnapshotSubject {
  scope: SnapshotScope;
  /** Null for the network (stored as 0). */
  scopeId: number | null;
  scopeName: string;
}

/**
 * The snapshot of one subject and period from the rows read: the stored row of the period when
 * there is one, else the period's month rows combined (flows summed, stock of the last month with
 * an approved tally; compliance and pending tallies summed). For a region or the network this
 * takes the stock from the scope's own months, not chapter by chapter: a chapter whose last
 * month is not approved yet drops out of the stock. `now` is the "as of" when nothing is stored:
 * no approved tally yet, so empty figures are current.
 */
export function snapshotOf(
  subject: SnapshotSubject,
  period: Period,
  rows: readonly SnapshotRow[],
  now: string,
): SnapshotView {
  const scopeId = subject.scopeId ?? 0;
  const mine = rows.filter((row) => row.scope === subject.scope && row.scopeId === scopeId);
  const stored = mine.find((row) => row.periodKind === period.kind && row.periodKey === period.key);
  if (stored) return viewOf(subject, period, stored);

  const months = new Set(monthsOf(period));
  const monthRows = mine
    .filter((row) => row.periodKind === 'month' && months.has(row.periodKey))
    .sort((a, b) => a.periodKey.localeCompare(b.periodKey));
  return {
    ...subject,
    period,
    figures: combineMonthsInto(monthRows.map((row) => row.figures)),
    compliance: monthRows.reduce(
      (sum, row) => addCompliance(sum, row.compliance),
      emptyCompliance(),
    ),
    pendingTallies: monthRows.reduce((sum, row) => sum + row.pendingTallies, 0),
    asOf: monthRows.length > 0 ? oldestAsOf(monthRows.map((row) => row.asOf)) : now,
  };
}

function viewOf(subject: SnapshotSubject, period: Period, row: SnapshotRow): SnapshotView {
  return {
    ...subject,
    period,
    figures: row.figures,
    compliance: row.compliance,
    pendingTallies: row.pendingTallies,
    asOf: row.asOf,
  };
}

/** The oldest of ISO timestamps (they sort as text once normalised to UTC). */
export function oldestAsOf(values: readonly string[]): string {
  return values.reduce((oldest, value) => (value < oldest ? value : oldest));
}
