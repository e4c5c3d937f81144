import { describe, expect, it } from 'vitest';
import {
  formatCount,
  formatDateTime,
  formatMonthYear,
  formatReportDueDay,
  formatUptime,
} from './format';

describe('formatting for screens', () => {
  it('puts thousands separators in counts', () => {
    expect(formatCount(12_345)).toBe('12,345');
    expect(formatCount(1_000_000)).toBe('1,000,000');
    expect(formatCount(7)).toBe('7');
  });

  it('shows a date as month and year, without slipping a month across time zones', () => {
    expect(formatMonthYear('2026-03-01')).toBe('Mar 2026');
    expect(formatMonthYear('2025-12-31')).toBe('Dec 2025');
  });

  it('leaves a date it cannot read as it was, rather than showing "Invalid Date"', () => {
    expect(formatMonthYear('soon')).toBe('soon');
  });

  it('says when a report is due', () => {
    expect(formatReportDueDay(10)).toBe('Day 10 of the following month');
  });

  it('reads uptime in days and hours, or hours and minutes', () => {
    expect(formatUptime(3 * 86_400 + 4 * 3_600 + 12 * 60)).toBe('3 days 4 hours');
    expect(formatUptime(2 * 3_600 + 5 * 60)).toBe('2 hours 5 minutes');
    expect(formatUptime(12)).toBe('less than a minute');
  });

  it('shows a moment as day, month, year and time, or "Never" when there is none', () => {
    // A local time, so the check holds in any time zone the tests run in.
    expect(formatDateTime('2026-03-14T09:05:00')).toBe('14 Mar 2026, 09:05');
    expect(formatDateTime(null)).toBe('Never');
  });
});
