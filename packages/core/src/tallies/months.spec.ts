import { DomainError } from '../errors/domain-error';
import {
  addMonths,
  compareMonths,
  isIsoDate,
  isMonthKey,
  monthEnd,
  monthLabel,
  monthOf,
  monthStart,
  monthsBetween,
  utcDateOf,
} from './months';

describe('isMonthKey', () => {
  it('accepts YYYY-MM with a month from 01 to 12', () => {
    expect(isMonthKey('2026-03')).toBe(true);
    expect(isMonthKey('1999-12')).toBe(true);
  });

  it('refuses anything else', () => {
    for (const value of ['2026-13', '2026-00', '2026-3', '26-03', '2026-03-01', '', 202603, null]) {
      expect(isMonthKey(value)).toBe(false);
    }
  });
});

describe('isIsoDate', () => {
  it('accepts real calendar dates only', () => {
    expect(isIsoDate('2024-02-29')).toBe(true);
    // Source: Gregorian calendar rule (ISO 8601 uses it): 2026 is not a leap year
    expect(isIsoDate('2026-02-29')).toBe(false);
    expect(isIsoDate('2026-04-31')).toBe(false);
    expect(isIsoDate('2026-4-01')).toBe(false);
  });
});

describe('monthOf and utcDateOf', () => {
  it('takes the month of a date', () => {
    expect(monthOf('2026-03-31')).toBe('2026-03');
  });

  it('reads a timestamp in UTC', () => {
    expect(monthOf('2026-03-31T22:00:00Z')).toBe('2026-03');
    // 23:30 at UTC−2 is 01:30 the next day in UTC
    expect(utcDateOf('2026-03-31T23:30:00-02:00')).toBe('2026-04-01');
    expect(monthOf('2026-03-31T23:30:00-02:00')).toBe('2026-04');
  });

  it('refuses what is not a date', () => {
    expect(() => monthOf('March 2026')).toThrow(DomainError);
    expect(() => monthOf('2026-02-30')).toThrow('isoDate must be an ISO date or timestamp');
  });
});

describe('addMonths', () => {
  it('moves forward and back across years', () => {
    expect(addMonths('2026-03', 1)).toBe('2026-04');
    expect(addMonths('2026-12', 1)).toBe('2027-01');
    expect(addMonths('2026-01', -1)).toBe('2025-12');
    expect(addMonths('2026-03', -27)).toBe('2023-12');
    expect(addMonths('2026-03', 24)).toBe('2028-03');
    expect(addMonths('2026-03', 0)).toBe('2026-03');
  });

  it('refuses a fractional step or a bad month', () => {
    expect(() => addMonths('2026-03', 1.5)).toThrow('n must be a whole number of months; got 1.5.');
    expect(() => addMonths('2026-3', 1)).toThrow('month must be a month as YYYY-MM');
  });
});

describe('compareMonths', () => {
  it('orders months', () => {
    expect(compareMonths('2025-12', '2026-01')).toBeLessThan(0);
    expect(compareMonths('2026-01', '2025-12')).toBeGreaterThan(0);
    expect(compareMonths('2026-01', '2026-01')).toBe(0);
    expect(['2026-02', '2025-11', '2026-01'].sort(compareMonths)).toEqual([
      '2025-11',
      '2026-01',
      '2026-02',
    ]);
  });

  it('names the bad argument', () => {
    let caught: unknown;
    try {
      compareMonths('2026-01', 'soon');
    } catch (error) {
      caught = error;
    }
    expect((caught as DomainError).argument).toBe('b');
  });
});

describe('monthStart and monthEnd', () => {
  it('gives the first and the last day', () => {
    expect(monthStart('2026-03')).toBe('2026-03-01');
    expect(monthEnd('2026-03')).toBe('2026-03-31');
    expect(monthEnd('2026-04')).toBe('2026-04-30');
    expect(monthEnd('2026-12')).toBe('2026-12-31');
  });

  it('knows the leap years', () => {
    // Source: Gregorian calendar rule (ISO 8601): a leap year is divisible by 4, except
    // centuries not divisible by 400
    expect(monthEnd('2024-02')).toBe('2024-02-29');
    expect(monthEnd('2026-02')).toBe('2026-02-28');
    expect(monthEnd('1900-02')).toBe('1900-02-28');
    expect(monthEnd('2000-02')).toBe('2000-02-29');
  });
});

describe('monthsBetween', () => {
  it('lists every month, both ends included, oldest first', () => {
    expect(monthsBetween('2025-11', '2026-02')).toEqual([
      '2025-11',
      '2025-12',
      '2026-01',
      '2026-02',
    ]);
    expect(monthsBetween('2026-03', '2026-03')).toEqual(['2026-03']);
    expect(monthsBetween('2024-01', '2025-12')).toHaveLength(24);
  });

  it('is empty when from is after to', () => {
    expect(monthsBetween('2026-04', '2026-03')).toEqual([]);
  });
});

describe('monthLabel', () => {
  it('writes the month as screens show it', () => {
    expect(monthLabel('2026-03')).toBe('Mar 2026');
    expect(monthLabel('2025-12')).toBe('Dec 2025');
    expect(monthLabel('2026-01')).toBe('Jan 2026');
  });
});
