import { addDays, daysBetween, requireIsoDate } from './days';

describe('addDays', () => {
  it('crosses month and leap-day boundaries', () => {
    // from memory: 2028 is a leap year, 2026 is not
    expect(addDays('2028-02-28', 1)).toBe('2028-02-29');
    expect(addDays('2026-02-28', 1)).toBe('2026-03-01');
    expect(addDays('2026-01-05', 83)).toBe('2026-03-29');
    expect(addDays('2026-01-01', -1)).toBe('2025-12-31');
  });

  it('does not shift over a daylight-saving change', () => {
    // common practice: many zones change clocks on the last Sunday of March
    expect(addDays('2026-03-28', 2)).toBe('2026-03-30');
  });

  it('refuses a fractional number of days', () => {
    expect(() => addDays('2026-01-01', 1.5)).toThrow(/n must be a whole number/);
  });
});

describe('daysBetween', () => {
  it('counts whole days, negative backwards', () => {
    expect(daysBetween('2026-01-05', '2026-02-09')).toBe(35);
    expect(daysBetween('2026-02-09', '2026-01-05')).toBe(-35);
    expect(daysBetween('2025-12-31', '2026-12-31')).toBe(365);
  });

  it('names the bad argument', () => {
    expect(() => daysBetween('2026-02-30', '2026-03-01')).toThrow(/from must be a date/);
    expect(() => requireIsoDate('endsOn', '2026-3-1')).toThrow(
      /endsOn must be a date as YYYY-MM-DD/,
    );
  });
});
