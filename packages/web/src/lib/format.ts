import { format, formatDuration, intervalToDuration, isValid, parseISO } from 'date-fns';

// One locale for every figure, so a column never mixes "1,234" and "1 234".
const countFormat = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

/** 12345 → "12,345". */
export function formatCount(value: number): string {
  return countFormat.format(value);
}

// Volunteer hours and weights carry up to two decimals; same locale as the counts.
const figureFormat = new Intl.NumberFormat('en-US', { maximumFractionDigits: 2 });

/** 1234 → "1,234"; 12.5 → "12.5". */
export function formatFigure(value: number): string {
  return figureFormat.format(value);
}

/** "2026-03-01" → "Mar 2026". Parsed as a local date so the month never slips across time zones. */
export function formatMonthYear(isoDate: string): string {
  const date = parseISO(isoDate);
  return isValid(date) ? format(date, 'MMM yyyy') : isoDate;
}

/** "2026-01-04" → "4 Jan 2026". Parsed as a local date so the day never slips across time zones. */
export function formatDate(isoDate: string): string {
  const date = parseISO(isoDate);
  return isValid(date) ? format(date, 'd MMM yyyy') : isoDate;
}

/** Today as YYYY-MM-DD in the reader's time zone, for date fields' `max`. */
export function todayIsoDate(now = new Date()): string {
  return format(now, 'yyyy-MM-dd');
}

/** 2_400_000 → "2.3 MB": a file's size in the unit a person reads at a glance. */
export function formatFileSize(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${Number((bytes / (1024 * 1024)).toFixed(1))} MB`;
  if (bytes >= 1024) return `${Math.round(bytes / 1024)} KB`;
  return `${bytes} bytes`;
}

/** 10 → "Day 10 of the following month". */
export function formatReportDueDay(dueDay: number): string {
  return `Day ${dueDay} of the following month`;
}

/** 273_600 → "3 days 4 hours"; under a minute → "less than a minute". */
export function formatUptime(totalSeconds: number): string {
  if (totalSeconds < 60) return 'less than a minute';
  const duration = intervalToDuration({ start: 0, end: Math.floor(totalSeconds) * 1000 });
  const units =
    totalSeconds >= 86_400
      ? (['years', 'months', 'days', 'hours'] as const)
      : (['hours', 'minutes'] as const);
  return formatDuration(duration, { format: [...units] });
}

/** A moment of the day for "checked at" lines, e.g. "14:03:22". */
export function formatTimeOfDay(timestamp: number): string {
  return format(timestamp, 'HH:mm:ss');
}

/** "2026-03-14T09:05:00Z" → "14 Mar 2026, 09:05" in the reader's time zone; null → "Never". */
export function formatDateTime(isoTimestamp: string | null, never = 'Never'): string {
  if (!isoTimestamp) return never;
  const date = parseISO(isoTimestamp);
  return isValid(date) ? format(date, 'd MMM yyyy, HH:mm') : isoTimestamp;
}
