import type { MonthKey } from '../contract/tallies';
import { DomainError } from '../errors/domain-error';

// Calendar months as 'YYYY-MM'. Month keys sort as strings, which the API and the database use.

const MONTH_KEY = /^(\d{4})-(0[1-9]|1[0-2])$/;
const ISO_DATE = /^(\d{4})-(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])$/;
const MONTH_NAMES = [
  'Jan',
  'Feb',
  'Mar',
  'Apr',
  'May',
  'Jun',
  'Jul',
  'Aug',
  'Sep',
  'Oct',
  'Nov',
  'Dec',
] as const;

export function isMonthKey(value: unknown): value is MonthKey {
  return typeof value === 'string' && MONTH_KEY.test(value);
}

function requireMonth(argument: string, month: MonthKey): { year: number; month: number } {
  const match = typeof month === 'string' ? MONTH_KEY.exec(month) : null;
  if (!match) {
    throw new DomainError(
      argument,
      `${argument} must be a month as YYYY-MM; got ${JSON.stringify(month)}.`,
    );
  }
  return { year: Number(match[1]), month: Number(match[2]) };
}

function keyOf(year: number, month: number): MonthKey {
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}`;
}

function daysIn(year: number, month: number): number {
  // Day 0 of the next month is the last day of this one; Date.UTC knows the leap years.
  return new Date(Date.UTC(year, month, 0)).getUTCDate();
}

/** True for a real calendar date written as YYYY-MM-DD (no 30 February). */
export function isIsoDate(value: unknown): value is string {
  if (typeof value !== 'string') return false;
  const match = ISO_DATE.exec(value);
  return match !== null && Number(match[3]) <= daysIn(Number(match[1]), Number(match[2]));
}

/**
 * The UTC calendar date of an ISO date or timestamp: '2026-03-31' stays as it is,
 * '2026-03-31T23:30:00-02:00' becomes '2026-04-01'.
 */
export function utcDateOf(isoDateOrTimestamp: string, argument = 'date'): string {
  if (isIsoDate(isoDateOrTimestamp)) return isoDateOrTimestamp;
  const time =
    typeof isoDateOrTimestamp === 'string' && /^\d{4}-\d{2}-\d{2}T/.test(isoDateOrTimestamp)
      ? Date.parse(isoDateOrTimestamp)
      : Number.NaN;
  if (Number.isNaN(time)) {
    throw new DomainError(
      argument,
      `${argument} must be an ISO date or timestamp; got ${JSON.stringify(isoDateOrTimestamp)}.`,
    );
  }
  return new Date(time).toISOString().slice(0, 10);
}

/** The month of an ISO date or timestamp (timestamps are read in UTC). */
export function monthOf(isoDate: string): MonthKey {
  return utcDateOf(isoDate, 'isoDate').slice(0, 7);
}

export function addMonths(month: MonthKey, n: number): MonthKey {
  const { year, month: m } = requireMonth('month', month);
  if (typeof n !== 'number' || !Number.isInteger(n)) {
    throw new DomainError('n', `n must be a whole number of months; got ${String(n)}.`);
  }
  const index = year * 12 + (m - 1) + n;
  return keyOf(Math.floor(index / 12), (index % 12) + 1);
}

/** Negative when a is earlier, 0 when equal, positive when later. */
export function compareMonths(a: MonthKey, b: MonthKey): number {
  requireMonth('a', a);
  requireMonth('b', b);
  return a < b ? -1 : a > b ? 1 : 0;
}

export function monthStart(month: MonthKey): string {
  requireMonth('month', month);
  return `${month}-01`;
}

export function monthEnd(month: MonthKey): string {
  const { year, month: m } = requireMonth('month', month);
  return `${month}-${String(daysIn(year, m)).padStart(2, '0')}`;
}

/** Every month from `from` to `to`, both included, oldest first; empty when `from` is later. */
export function monthsBetween(from: MonthKey, to: MonthKey): MonthKey[] {
  const months: MonthKey[] = [];
  if (compareMonths(from, to) > 0) return months;
  for (let month = from; month <= to; month = addMonths(month, 1)) months.push(month);
  return months;
}

/** 'Mar 2026', the way screens show a month. */
export function monthLabel(month: MonthKey): string {
  const { year, month: m } = requireMonth('month', month);
  return `${MONTH_NAMES[m - 1]} ${year}`;
}
