import type { ChapterInfo, TallyStatus } from '@tallyloom/reports';

/** Rows of the report definitions' SQL, read into what the roll-up takes. */
type Row = Record<string, unknown>;

/** A DATE column as 'YYYY-MM-DD' (the driver may give a Date or text). */
export function isoDate(value: unknown): string | null {
  if (value instanceof Date) return value.toISOString().slice(0, 10);
  return typeof value === 'string' ? value.slice(0, 10) : null;
}

/** A DATETIME read at the connection's UTC time zone, as an ISO timestamp. */
export function isoTimestamp(value: unknown): string | null {
  if (value instanceof Date) return value.toISOString();
  if (typeof value !== 'string') return null;
  return new Date(
    /[zZ]|[+-]\d\d:?\d\d$/.test(value) ? value : `${value.replace(' ', 'T')}Z`,
  ).toISOString();
}

/** A row of `chaptersSql`. */
export function chapterInfoFromRow(row: Row): ChapterInfo {
  return {
    chapterId: Number(row.chapter_id),
    regionId: Number(row.region_id),
    dueDay: Number(row.reporting_due_day),
    activeFrom: isoDate(row.active_from)!,
    activeTo: isoDate(row.active_to),
  };
}

/** A row of `tallyStatusSql`. */
export function tallyStatusFromRow(row: Row): TallyStatus {
  return {
    chapterId: Number(row.chapter_id),
    month: String(row.month),
    firstSubmittedAt: isoTimestamp(row.first_submitted_at),
    pending: Number(row.pending) === 1,
    approved:
      row.approved_revision === null || row.approved_revision === undefined
        ? null
        : {
            tallyId: Number(row.tally_id),
            revision: Number(row.approved_revision),
            panelsClosing: Number(row.panels_closing),
            blanketsClosing: Number(row.blankets_closing),
          },
  };
}
