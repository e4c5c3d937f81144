import { format, getQuarter, getYear, parseISO, subMonths, subQuarters } from 'date-fns';
import type { PeriodKind } from '@tallyloom/core';

export interface PeriodOption {
  key: string;
  label: string;
}

export const PERIOD_KIND_LABELS: Record<PeriodKind | 'custom', string> = {
  month: 'Month',
  quarter: 'Quarter',
  fiscal_year: 'Fiscal year',
  custom: 'Custom range',
};

/** How far back each picker reaches; older periods stay reachable through a link. */
export const RECENT_COUNT: Record<PeriodKind, number> = { month: 36, quarter: 12, fiscal_year: 6 };

/** Months newest first, this month included: 'YYYY-MM' with "Mar 2026". */
export function recentMonthOptions(today: string, count = RECENT_COUNT.month): PeriodOption[] {
  const now = parseISO(today);
  return Array.from({ length: count }, (_, index) => {
    const month = subMonths(now, index);
    return { key: format(month, 'yyyy-MM'), label: format(month, 'MMM yyyy') };
  });
}

/** Calendar quarters newest first: 'YYYY-Qn' with "Q1 2026". */
export function recentQuarterOptions(today: string, count = RECENT_COUNT.quarter): PeriodOption[] {
  const now = parseISO(today);
  return Array.from({ length: count }, (_, index) => {
    const day = subQuarters(now, index);
    const quarter = getQuarter(day);
    return { key: `${getYear(day)}-Q${quarter}`, label: `Q${quarter} ${getYear(day)}` };
  });
}

/**
 * Fiscal years newest first, named by the year they end in (the contract's 'FY2026'). The start
 * month is a network setting the server applies, so next year's is offered too: with a start
 * month after January, the fiscal year under way ends next calendar year.
 */
export function recentFiscalYearOptions(
  today: string,
  count = RECENT_COUNT.fiscal_year,
): PeriodOption[] {
  const nextYear = getYear(parseISO(today)) + 1;
  return Array.from({ length: count }, (_, index) => {
    const year = nextYear - index;
    return { key: `FY${year}`, label: `FY${year} (ends in ${year})` };
  });
}
