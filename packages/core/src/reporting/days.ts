import { DomainError } from '../errors/domain-error';
import { requireWholeNumber } from '../errors/require';
import { isIsoDate } from '../tallies/months';

// Calendar dates as 'YYYY-MM-DD', counted in UTC days so that daylight saving never shifts them.

const DAY_MS = 86_400_000;

/** Throws a DomainError naming `argument` unless `value` is a real YYYY-MM-DD date. */
export function requireIsoDate(argument: string, value: string): string {
  if (!isIsoDate(value)) {
    throw new DomainError(
      argument,
      `${argument} must be a date as YYYY-MM-DD; got ${JSON.stringify(value)}.`,
    );
  }
  return value;
}

function dayNumber(argument: string, date: string): number {
  return Date.parse(`${requireIsoDate(argument, date)}T00:00:00Z`) / DAY_MS;
}

export function addDays(date: string, n: number): string {
  requireWholeNumber('n', Math.abs(n));
  return new Date((dayNumber('date', date) + n) * DAY_MS).toISOString().slice(0, 10);
}

/** Days from `from` to `to`: 0 on the same day, negative when `to` is earlier. */
export function daysBetween(from: string, to: string): number {
  return dayNumber('to', to) - dayNumber('from', from);
}
