import { DomainError } from '../errors/domain-error';
import { requireWholeNumber } from '../errors/require';
import { utcDateOf } from '../tallies/months';
import { addDays, daysBetween, requireIsoDate } from './days';

// Campaign weeks are 7-day blocks counted from the campaign's start date (not calendar weeks),
// so week 1 always starts on the first day of the drive.

export interface WeeklyPanels {
  weekStart: string;
  panels: number;
  cumulative: number;
}

/** The first day of every campaign week from startsOn up to endsOn (the last may be partial). */
export function weekStartsBetween(startsOn: string, endsOn: string): string[] {
  requireIsoDate('startsOn', startsOn);
  requireIsoDate('endsOn', endsOn);
  if (endsOn < startsOn) {
    throw new DomainError(
      'endsOn',
      `endsOn (${endsOn}) must not be earlier than startsOn (${startsOn}).`,
    );
  }
  const starts: string[] = [];
  for (let day = 0; day <= daysBetween(startsOn, endsOn); day += 7) {
    starts.push(addDays(startsOn, day));
  }
  return starts;
}

/**
 * Panels per campaign week with a running total, every week present (0 when nothing came in).
 * Weeks run from startsOn to the later of `through` and the last receipt's week, so no receipt
 * is dropped. Receipts dated before the start (early parcels) count in the first week.
 * `receivedOn` may be a date or a timestamp (read in UTC).
 */
export function bucketByWeek(
  startsOn: string,
  receipts: ReadonlyArray<{ receivedOn: string; panels: number }>,
  through?: string,
): WeeklyPanels[] {
  requireIsoDate('startsOn', startsOn);
  const weekIndex = (date: string) => Math.max(0, Math.floor(daysBetween(startsOn, date) / 7));
  const totals: number[] = [];
  receipts.forEach((receipt, i) => {
    const index = weekIndex(utcDateOf(receipt.receivedOn, `receipts[${i}].receivedOn`));
    requireWholeNumber(`receipts[${i}].panels`, receipt.panels);
    totals[index] = (totals[index] ?? 0) + receipt.panels;
  });
  const lastIndex = Math.max(
    totals.length - 1,
    through === undefined ? -1 : weekIndex(requireIsoDate('through', through)),
  );
  const weekly: WeeklyPanels[] = [];
  let cumulative = 0;
  for (let index = 0; index <= lastIndex; index++) {
    const panels = totals[index] ?? 0;
    cumulative += panels;
    weekly.push({ weekStart: addDays(startsOn, index * 7), panels, cumulative });
  }
  return weekly;
}
