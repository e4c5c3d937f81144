import { addMonths, monthOf, tallyDueOn, type MonthKey } from '@tallyloom/core';

export type ReminderKind = 'before_due' | 'after_due';

/** An ISO date moved by whole days, in UTC. */
export function addDays(isoDate: string, days: number): string {
  const time = Date.parse(`${isoDate}T00:00:00Z`) + days * 86_400_000;
  return new Date(time).toISOString().slice(0, 10);
}

/** A tally falls due in the month after its own, so only one month can be due on `date`. */
export function monthDueIn(date: string): MonthKey {
  return addMonths(monthOf(date), -1);
}

/**
 * The month whose tally is due on `date` for a chapter with this due day, or null. A due day
 * past a short month's end falls on its last day.
 */
export function monthDueOn(date: string, dueDay: number): MonthKey | null {
  const month = monthDueIn(date);
  return tallyDueOn(month, dueDay) === date ? month : null;
}

/** The due dates that call for a reminder today: N days ahead, and N days past. */
export function reminderDueDates(
  today: string,
  days: { reminderDaysBeforeDue: number; reminderDaysAfterDue: number },
): Array<{ kind: ReminderKind; dueOn: string }> {
  return [
    { kind: 'before_due', dueOn: addDays(today, days.reminderDaysBeforeDue) },
    { kind: 'after_due', dueOn: addDays(today, -days.reminderDaysAfterDue) },
  ];
}
