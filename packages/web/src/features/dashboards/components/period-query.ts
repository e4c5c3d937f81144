import {
  addMonths,
  compareMonths,
  isMonthKey,
  monthOf,
  type DashboardParams,
} from '@tallyloom/core';
import { todayIsoDate } from '@/lib/format';

const QUARTER_KEY = /^\d{4}-Q[1-4]$/;
const FISCAL_YEAR_KEY = /^FY\d{4}$/;

/** The month before this one: the latest month whose tallies can be complete. */
export function defaultDashboardParams(today = todayIsoDate()): DashboardParams {
  return { periodKind: 'month', period: addMonths(monthOf(today), -1) };
}

/**
 * The dashboard's period from its URL (`?periodKind=quarter&period=2026-Q1`,
 * `?periodKind=custom&from=2025-07&to=2026-02`); anything unreadable falls back to last month.
 */
export function parseDashboardQuery(params: URLSearchParams, today?: string): DashboardParams {
  const kind = params.get('periodKind');
  const period = params.get('period');
  if (kind === 'month' && isMonthKey(period)) return { periodKind: 'month', period };
  if (kind === 'quarter' && period && QUARTER_KEY.test(period)) {
    return { periodKind: 'quarter', period };
  }
  if (kind === 'fiscal_year' && period && FISCAL_YEAR_KEY.test(period)) {
    return { periodKind: 'fiscal_year', period };
  }
  if (kind === 'custom') {
    const from = params.get('from');
    const to = params.get('to');
    if (isMonthKey(from) && isMonthKey(to) && compareMonths(from, to) <= 0) {
      return { periodKind: 'custom', from, to };
    }
  }
  return defaultDashboardParams(today);
}

/** The URL's query string for a period: the same names the API reads. */
export function dashboardSearchParams(query: DashboardParams): URLSearchParams {
  const params = new URLSearchParams({ periodKind: query.periodKind });
  if (query.periodKind === 'custom') {
    if (query.from) params.set('from', query.from);
    if (query.to) params.set('to', query.to);
  } else if (query.period) {
    params.set('period', query.period);
  }
  return params;
}

/** `?periodKind=…`: kept when moving between the network, a region and a chapter. */
export function dashboardSearch(query: DashboardParams): string {
  return `?${dashboardSearchParams(query).toString()}`;
}
