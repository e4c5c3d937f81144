import type { MonthKey, ReportingStatus } from '../contract/tallies';
import { DomainError } from '../errors/domain-error';
import { requireWholeNumber } from '../errors/require';
import { addMonths, isIsoDate, monthEnd, monthStart, utcDateOf } from './months';

/**
 * The date a month's tally is due: `dueDay` of the following month. A due day past the end of a
 * short month falls on its last day (31 → 28 or 29 February).
 */
export function tallyDueOn(month: MonthKey, dueDay: number): string {
  requireWholeNumber('dueDay', dueDay, 1);
  if (dueDay > 31) {
    throw new DomainError('dueDay', `dueDay must be a day of the month (1 to 31); got ${dueDay}.`);
  }
  const following = addMonths(month, 1);
  const lastDay = monthEnd(following);
  const day = Math.min(dueDay, Number(lastDay.slice(8)));
  return `${following}-${String(day).padStart(2, '0')}`;
}

export interface ReportingStatusInput {
  month: MonthKey;
  dueDay: number;
  /** ISO timestamp of the first submission of the month's tally; null when never submitted. */
  firstSubmittedAt: string | null;
  /** ISO date, the caller's today (the server passes its own, so tests can pin it). */
  today: string;
}

/**
 * Whether a chapter-month was reported on time. Only the first submission counts, so a tally
 * returned and resubmitted after the due date stays on time. Computed, never stored.
 */
export function reportingStatus(input: ReportingStatusInput): ReportingStatus {
  const dueOn = tallyDueOn(input.month, input.dueDay);
  if (input.firstSubmittedAt !== null && input.firstSubmittedAt !== undefined) {
    return submissionStatus(utcDateOf(input.firstSubmittedAt, 'firstSubmittedAt'), dueOn);
  }
  if (!isIsoDate(input.today)) {
    throw new DomainError(
      'today',
      `today must be an ISO date (YYYY-MM-DD); got ${JSON.stringify(input.today)}.`,
    );
  }
  // A month can only be reported once it is over.
  if (input.today < monthStart(addMonths(input.month, 1))) return 'upcoming';
  return input.today <= dueOn ? 'due' : 'missing';
}

/**
 * A submitted month's status from the UTC date of its first submission and its due date (both
 * 'YYYY-MM-DD'): on time up to and including the due day.
 */
export function submissionStatus(submittedOn: string, dueOn: string): 'on-time' | 'late' {
  return submittedOn <= dueOn ? 'on-time' : 'late';
}
