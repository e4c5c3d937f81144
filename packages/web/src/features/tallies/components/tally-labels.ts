import {
  monthLabel,
  type TallyCheckContext,
  REPORTING_STATUS_LABELS,
  TALLY_STATE_LABELS,
  type ReportingStatus,
  type TallyState,
} from '@tallyloom/core';
import { formatDate } from '@/lib/format';

/** BRIEF §8: shown where baby blankets are handed out. */
export const SAFE_SLEEP_CAUTION =
  "Follow safe-sleep guidance for infants: no loose blankets in a sleeping infant's cot; the partner agency's own rules come first.";

/** Baby and infant sizes get the safe-sleep caution. */
export function isBabySize(name: string): boolean {
  return /\bbaby\b|\binfant\b/i.test(name);
}

/** "Draft", "Approved", or "Amendment in progress" while an approved tally is being changed. */
export function tallyStateText(state: TallyState | null, amendmentPending = false): string {
  if (state === null) return 'Not started';
  if (amendmentPending && state !== 'approved') {
    return `Amendment in progress (${TALLY_STATE_LABELS[state].toLowerCase()})`;
  }
  return TALLY_STATE_LABELS[state];
}

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
