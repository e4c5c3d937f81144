import { monthOf, type MonthKey } from '@tallyloom/core';

/** Today's date in UTC: the day reporting status (due, late, missing) is judged on. */
export function todayUtc(now = new Date()): string {
  return now.toISOString().slice(0, 10);
}

/**
 * The current month where it is already latest (UTC+14), so a chapter anywhere on Earth can
 * start the month it is in; a month after that is in the future.
 */
export function latestMonth(now = new Date()): MonthKey {
  return monthOf(new Date(now.getTime() + 14 * 3600_000).toISOString());
}
