import { describe, expect, it } from 'vitest';
import { dashboardSearchParams, parseDashboardQuery } from './period-query';
import { recentFiscalYearOptions, recentQuarterOptions } from './period-options';

const today = '2026-04-12';
const parse = (search: string) => parseDashboardQuery(new URLSearchParams(search), today);

describe('the dashboard period in the URL', () => {
  it('reads each kind of period', () => {
    expect(parse('periodKind=month&period=2026-02')).toEqual({
      periodKind: 'month',
      period: '2026-02',
    });
    expect(parse('periodKind=quarter&period=2025-Q4')).toEqual({
      periodKind: 'quarter',
      period: '2025-Q4',
    });
    expect(parse('periodKind=fiscal_year&period=FY2026')).toEqual({
      periodKind: 'fiscal_year',
      period: 'FY2026',
    });
    expect(parse('periodKind=custom&from=2025-07&to=2026-02')).toEqual({
      periodKind: 'custom',
      from: '2025-07',
      to: '2026-02',
    });
  });

  it('falls back to last month for anything unreadable', () => {
    const lastMonth = { periodKind: 'month', period: '2026-03' };
    expect(parse('')).toEqual(lastMonth);
    expect(parse('periodKind=month&period=2026-13')).toEqual(lastMonth);
    expect(parse('periodKind=quarter&period=2026-Q5')).toEqual(lastMonth);
    expect(parse('periodKind=custom&from=2026-02&to=2025-07')).toEqual(lastMonth);
    expect(parse('periodKind=week&period=2026-03')).toEqual(lastMonth);
  });

  it('writes the same names back, without the ones the kind does not use', () => {
    expect(dashboardSearchParams({ periodKind: 'quarter', period: '2026-Q1' }).toString()).toBe(
      'periodKind=quarter&period=2026-Q1',
    );
    expect(
      dashboardSearchParams({
        periodKind: 'custom',
        period: 'x',
        from: '2025-07',
        to: '2026-02',
      }).toString(),
    ).toBe('periodKind=custom&from=2025-07&to=2026-02');
  });

  it('offers calendar quarters and fiscal years named by the year they end in', () => {
    expect(recentQuarterOptions(today, 3)).toEqual([
      { key: '2026-Q2', label: 'Q2 2026' },
      { key: '2026-Q1', label: 'Q1 2026' },
      { key: '2025-Q4', label: 'Q4 2025' },
    ]);
    expect(recentFiscalYearOptions(today, 2).map((option) => option.key)).toEqual([
      'FY2027',
      'FY2026',
    ]);
  });
});
