import type { ComplianceFigures } from '../contract/reports';
import type { MonthKey, ReportingStatus } from '../contract/tallies';
import { reportingStatus } from '../tallies/reporting';

export interface ComplianceEntry {
  month: MonthKey;
  dueDay: number;
  /** ISO timestamp of the first submission; null when never submitted. */
  firstSubmittedAt: string | null;
}

/**
 * Where a chapter-month's reporting status counts besides `expected`: 'upcoming' and 'due' are
 * still open, neither late nor missing yet.
 */
export const COMPLIANCE_FIELD: Record<
  ReportingStatus,
  Exclude<keyof ComplianceFigures, 'expected'>
> = {
  'on-time': 'onTime',
  late: 'late',
  missing: 'missing',
  upcoming: 'open',
  due: 'open',
};

/** Reporting compliance of the chapter-months given (one entry per chapter and month expected to report). */
export function complianceOf(
  entries: ReadonlyArray<ComplianceEntry>,
  today: string,
): ComplianceFigures {
  const figures = emptyCompliance();
  for (const entry of entries) {
    figures.expected += 1;
    figures[COMPLIANCE_FIELD[reportingStatus({ ...entry, today })]] += 1;
  }
  return figures;
}

export function emptyCompliance(): ComplianceFigures {
  return { expected: 0, onTime: 0, late: 0, missing: 0, open: 0 };
}

/** Sums compliance of several scopes or months (every chapter-month counted once in each). */
export function addCompliance(a: ComplianceFigures, b: ComplianceFigures): ComplianceFigures {
  return {
    expected: a.expected + b.expected,
    onTime: a.onTime + b.onTime,
    late: a.late + b.late,
    missing: a.missing + b.missing,
    open: a.open + b.open,
  };
}
