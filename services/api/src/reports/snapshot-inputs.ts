import type { ChapterInfo, TallyStatus } from '@tallyloom/reports';
import { isoDate, isoTimestamp, orNull } from '../common/sql/column-values';

/** Rows of the report definitions' SQL, read into what the roll-up takes. */
type Row = Record<string, unknown>;

/** A row of `chaptersSql`. */
export function chapterInfoFromRow(row: Row): ChapterInfo {
  return {
    chapterId: Number(row.chapter_id),
    regionId: Number(row.region_id),
    dueDay: Number(row.reporting_due_day),
    activeFrom: isoDate(row.active_from),
    activeTo: orNull(row.active_to, isoDate),
  };
}

/** A row of `tallyStatusSql`. */
export function tallyStatusFromRow(row: Row): TallyStatus {
  return {
    chapterId: Number(row.chapter_id),
    month: String(row.month),
    firstSubmittedAt: orNull(row.first_submitted_at, isoTimestamp),
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
