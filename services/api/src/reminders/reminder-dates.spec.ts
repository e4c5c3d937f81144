import { addDays, monthDueOn, reminderDueDates } from './reminder-dates';

describe('reminder dates', () => {
  it('moves dates across month and leap-year ends', () => {
    expect(addDays('2026-03-30', 3)).toBe('2026-04-02');
    expect(addDays('2028-03-01', -1)).toBe('2028-02-29');
    expect(addDays('2027-01-01', -2)).toBe('2026-12-30');
  });

  it('finds the month whose tally falls due on a date', () => {
    expect(monthDueOn('2026-04-10', 10)).toBe('2026-03');
    expect(monthDueOn('2026-01-10', 10)).toBe('2025-12');
    expect(monthDueOn('2026-04-11', 10)).toBeNull();
  });

  it('lets a due day past the end of February fall on its last day, and only there', () => {
    expect(monthDueOn('2026-02-28', 31)).toBe('2026-01');
    expect(monthDueOn('2028-02-29', 30)).toBe('2028-01');
    expect(monthDueOn('2028-02-28', 30)).toBeNull();
  });

  it('looks N days ahead for the first reminder and N days back for the second', () => {
    expect(
      reminderDueDates('2026-04-07', { reminderDaysBeforeDue: 3, reminderDaysAfterDue: 2 }),
    ).toEqual([
      { kind: 'before_due', dueOn: '2026-04-10' },
      { kind: 'after_due', dueOn: '2026-04-05' },
    ]);
  });
});
