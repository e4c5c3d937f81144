import { DomainError } from '../errors/domain-error';
import {
  customPeriod,
  fiscalYearOf,
  fiscalYearPeriod,
  isStoredPeriodKind,
  monthPeriod,
  monthsOf,
  parsePeriod,
  periodDates,
  periodLabel,
  periodsContaining,
  previousPeriod,
  quarterOf,
  quarterPeriod,
} from './periods';

const span = (p: { key: string; from: string; to: string; label: string }) => [
  p.key,
  p.from,
  p.to,
  p.label,
];

describe('monthPeriod', () => {
  it('is the month itself', () => {
    expect(monthPeriod('2026-03')).toEqual({
      kind: 'month',
      key: '2026-03',
      from: '2026-03',
      to: '2026-03',
      label: 'Mar 2026',
    });
  });

  it('refuses a bad month', () => {
    expect(() => monthPeriod('2026-13')).toThrow(/month must be a month as YYYY-MM/);
  });
});

describe('quarterPeriod', () => {
  it('maps calendar quarters to their three months', () => {
    // common practice: calendar quarters Q1 Jan–Mar, Q2 Apr–Jun, Q3 Jul–Sep, Q4 Oct–Dec
    expect(span(quarterPeriod('2026-Q1'))).toEqual(['2026-Q1', '2026-01', '2026-03', 'Q1 2026']);
    expect(span(quarterPeriod('2026-Q2'))).toEqual(['2026-Q2', '2026-04', '2026-06', 'Q2 2026']);
    expect(span(quarterPeriod('2025-Q4'))).toEqual(['2025-Q4', '2025-10', '2025-12', 'Q4 2025']);
  });

  it.each(['2026-Q5', '2026-Q0', '2026Q1', 'Q1 2026', '2026-q1'])('refuses %s', (key) => {
    expect(() => quarterPeriod(key)).toThrow(/A quarter must be written YYYY-Qn/);
  });
});

describe('fiscalYearPeriod', () => {
  it('names the fiscal year by the year it ends in (July start)', () => {
    expect(span(fiscalYearPeriod('FY2026', 7))).toEqual([
      'FY2026',
      '2025-07',
      '2026-06',
      'FY 2025–26',
    ]);
  });

  it('is the calendar year with a January start', () => {
    expect(span(fiscalYearPeriod('FY2026', 1))).toEqual([
      'FY2026',
      '2026-01',
      '2026-12',
      'FY 2026',
    ]);
  });

  it('runs Apr–Mar with an April start and Oct–Sep with an October start', () => {
    // from memory: common fiscal years start in April (UK charities) or October (US federal)
    expect(span(fiscalYearPeriod('FY2026', 4)).slice(1, 3)).toEqual(['2025-04', '2026-03']);
    expect(span(fiscalYearPeriod('FY2026', 10)).slice(1, 3)).toEqual(['2025-10', '2026-09']);
  });

  it('always has 12 months', () => {
    for (let start = 1; start <= 12; start++) {
      expect(monthsOf(fiscalYearPeriod('FY2030', start))).toHaveLength(12);
    }
  });

  it('refuses a bad key or start month, naming it', () => {
    expect(() => fiscalYearPeriod('2026', 7)).toThrow(/A fiscal year must be written FY/);
    expect(() => fiscalYearPeriod('FY26', 7)).toThrow(DomainError);
    expect(() => fiscalYearPeriod('FY2026', 13)).toThrow(
      /fiscalYearStartMonth must be a month number from 1 to 12/,
    );
    expect(() => fiscalYearPeriod('FY2026', 0)).toThrow(/fiscalYearStartMonth/);
  });
});

describe('customPeriod', () => {
  it('spans whole months, both ends included', () => {
    expect(span(customPeriod('2025-11', '2026-02'))).toEqual([
      '2025-11..2026-02',
      '2025-11',
      '2026-02',
      'Nov 2025 – Feb 2026',
    ]);
    expect(customPeriod('2026-02', '2026-02').label).toBe('Feb 2026');
  });

  it('refuses an end before the start', () => {
    expect(() => customPeriod('2026-03', '2026-02')).toThrow(
      /to \(2026-02\) must not be earlier than from/,
    );
  });
});

describe('parsePeriod', () => {
  it('reads every kind from its key', () => {
    expect(parsePeriod('month', '2026-03', 7)).toEqual(monthPeriod('2026-03'));
    expect(parsePeriod('quarter', '2026-Q3', 7)).toEqual(quarterPeriod('2026-Q3'));
    expect(parsePeriod('fiscal_year', 'FY2026', 7).from).toBe('2025-07');
    expect(parsePeriod('custom', '2025-11..2026-02', 7)).toEqual(
      customPeriod('2025-11', '2026-02'),
    );
  });

  it('throws a DomainError with a clear message on a bad key', () => {
    expect(() => parsePeriod('month', '2026-3', 7)).toThrow(
      /A month must be written YYYY-MM; got "2026-3"/,
    );
    expect(() => parsePeriod('custom', '2025-11/2026-02', 7)).toThrow(/YYYY-MM\.\.YYYY-MM/);
    expect(() => parsePeriod('week' as never, '2026-W01', 7)).toThrow(
      /kind must be one of month, quarter, fiscal_year, custom/,
    );
    try {
      parsePeriod('quarter', 'nonsense', 7);
      throw new Error('expected a DomainError');
    } catch (error) {
      expect(error).toBeInstanceOf(DomainError);
      expect((error as DomainError).argument).toBe('key');
    }
  });
});

describe('periodsContaining', () => {
  it('gives the month, its quarter and its fiscal year', () => {
    expect(periodsContaining('2026-03', 7).map((p) => `${p.kind}:${p.key}`)).toEqual([
      'month:2026-03',
      'quarter:2026-Q1',
      'fiscal_year:FY2026',
    ]);
  });

  it('puts a month on or after the start month in the next fiscal year', () => {
    expect(fiscalYearOf('2025-07', 7).key).toBe('FY2026');
    expect(fiscalYearOf('2025-06', 7).key).toBe('FY2025');
    expect(fiscalYearOf('2026-12', 1).key).toBe('FY2026');
    expect(fiscalYearOf('2026-01', 1).key).toBe('FY2026');
  });

  it('always contains the month it was asked about', () => {
    for (let start = 1; start <= 12; start++) {
      for (const month of monthsOf(customPeriod('2025-01', '2026-12'))) {
        for (const period of periodsContaining(month, start)) {
          expect(monthsOf(period)).toContain(month);
        }
      }
    }
  });

  it('finds the quarter of each month', () => {
    expect(quarterOf('2026-04').key).toBe('2026-Q2');
    expect(quarterOf('2026-12').key).toBe('2026-Q4');
  });
});

describe('previousPeriod', () => {
  it('steps back one period of the same kind, across years', () => {
    expect(previousPeriod(monthPeriod('2026-01'), 7).key).toBe('2025-12');
    expect(previousPeriod(quarterPeriod('2026-Q1'), 7).key).toBe('2025-Q4');
    expect(span(previousPeriod(fiscalYearPeriod('FY2026', 7), 7))).toEqual([
      'FY2025',
      '2024-07',
      '2025-06',
      'FY 2024–25',
    ]);
  });

  it('gives a custom range of the same length just before', () => {
    expect(previousPeriod(customPeriod('2026-02', '2026-04'), 7)).toEqual(
      customPeriod('2025-11', '2026-01'),
    );
    expect(previousPeriod(customPeriod('2026-02', '2026-02'), 7).key).toBe('2026-01..2026-01');
  });
});

describe('monthsOf and periodDates', () => {
  it('lists the months oldest first and gives the first and last day', () => {
    expect(monthsOf(quarterPeriod('2028-Q1'))).toEqual(['2028-01', '2028-02', '2028-03']);
    // from memory: 2028 is a leap year
    expect(periodDates(customPeriod('2028-01', '2028-02'))).toEqual({
      fromDate: '2028-01-01',
      toDate: '2028-02-29',
    });
  });
});

describe('periodLabel and isStoredPeriodKind', () => {
  it('labels a period read back from a snapshot row', () => {
    expect(
      periodLabel({ kind: 'fiscal_year', key: 'FY2000', from: '1999-10', to: '2000-09' }),
    ).toBe('FY 1999–00');
  });

  it('knows custom ranges are not stored', () => {
    expect(isStoredPeriodKind('quarter')).toBe(true);
    expect(isStoredPeriodKind('custom')).toBe(false);
  });
});
