import {
  monthLabel,
  type TallyCheckContext,
  REPORTING_STATUS_LABELS,
  type ReportingStatus,
} from '@tallyloom/core';
import { formatDate } from '@/lib/format';

/** "Due by 10 Apr 2026", "Late", "Missing (was due 10 Apr 2026)", "On time". */
export function reportingText(reporting: ReportingStatus, dueOn: string): string {
  switch (reporting) {
    case 'upcoming':
    case 'due':
      return `Due by ${formatDate(dueOn)}`;
    case 'missing':
      return `Missing (was due ${formatDate(dueOn)})`;
    case 'late':
      return `Late (was due ${formatDate(dueOn)})`;
    default:
      return REPORTING_STATUS_LABELS[reporting];
  }
}

/** "Mar 2026 tally · Alder Falls". */
export function tallyTitle(month: string, chapterName: string): string {
  return `${monthLabel(month)} tally · ${chapterName}`;
}

/** Where an opening stock comes from: last month's closing, or typed in for a first tally. */
export function openingHint(context: TallyCheckContext, enteredByHand: boolean): string {
  const expected = context.expectedOpening;
  if (enteredByHand || !expected) return "Entered by hand: the chapter's first tally";
  const carried = `Carried from ${monthLabel(expected.fromMonth)} closing stock`;
  return expected.approved ? carried : `${carried} (not approved yet)`;
}
