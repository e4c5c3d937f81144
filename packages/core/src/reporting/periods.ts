import type { MonthKey } from '../contract/tallies';
import { PERIOD_KINDS, type Period, type PeriodKind } from '../contract/reports';
import { DomainError } from '../errors/domain-error';
import {
  addMonths,
  compareMonths,
  isMonthKey,
  monthEnd,
  monthLabel,
  monthStart,
  monthsBetween,
} from '../tallies/months';

// Reporting periods (BRIEF §4.6): month → calendar quarter → fiscal year, plus custom ranges for
// dashboards. Every period is a whole number of calendar months.

const QUARTER_KEY = /^(\d{4})-Q([1-4])$/;
const FISCAL_YEAR_KEY = /^FY(\d{4})$/;
const CUSTOM_KEY = /^(\d{4}-\d{2})\.\.(\d{4}-\d{2})$/;

function requireMonthKey(argument: string, month: MonthKey): MonthKey {
  if (!isMonthKey(month)) {
    throw new DomainError(
      argument,
      `${argument} must be a month as YYYY-MM; got ${JSON.stringify(month)}.`,
    );
  }
  return month;
}

function requireFiscalYearStart(fiscalYearStartMonth: number): number {
  if (
    typeof fiscalYearStartMonth !== 'number' ||
    !Number.isInteger(fiscalYearStartMonth) ||
    fiscalYearStartMonth < 1 ||
    fiscalYearStartMonth > 12
  ) {
    throw new DomainError(
      'fiscalYearStartMonth',
      `fiscalYearStartMonth must be a month number from 1 to 12; got ${String(fiscalYearStartMonth)}.`,
    );
  }
  return fiscalYearStartMonth;
}

function monthKey(year: number, month: number): MonthKey {
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}`;
}

/** How screens name a period: "Mar 2026", "Q1 2026", "FY 2025–26", "Jan 2026 – May 2026". */
export function periodLabel(period: Pick<Period, 'kind' | 'key' | 'from' | 'to'>): string {
  switch (period.kind) {
    case 'month':
      return monthLabel(period.from);
    case 'quarter':
      return `Q${period.key.slice(-1)} ${period.key.slice(0, 4)}`;
    case 'fiscal_year': {
      const first = period.from.slice(0, 4);
      const last = period.to.slice(0, 4);
      return first === last ? `FY ${last}` : `FY ${first}–${last.slice(2)}`;
    }
    case 'custom':
      return period.from === period.to
        ? monthLabel(period.from)
        : `${monthLabel(period.from)} – ${monthLabel(period.to)}`;
  }
}

function periodOf(kind: Period['kind'], key: string, from: MonthKey, to: MonthKey): Period {
  return { kind, key, from, to, label: periodLabel({ kind, key, from, to }) };
}

export function monthPeriod(month: MonthKey): Period {
  requireMonthKey('month', month);
  return periodOf('month', month, month, month);
}

/** A calendar quarter, key 'YYYY-Qn': Q1 = Jan–Mar … Q4 = Oct–Dec. */
export function quarterPeriod(key: string): Period {
  const match = typeof key === 'string' ? QUARTER_KEY.exec(key) : null;
  if (!match) {
    throw new DomainError(
      'key',
      `A quarter must be written YYYY-Qn (n 1 to 4); got ${JSON.stringify(key)}.`,
    );
  }
  const from = monthKey(Number(match[1]), (Number(match[2]) - 1) * 3 + 1);
  return periodOf('quarter', key, from, addMonths(from, 2));
}

/**
 * The fiscal year named by the calendar year it ENDS in: with a July start, FY2026 runs
 * Jul 2025 – Jun 2026; with a January start it is the calendar year 2026.
 */
export function fiscalYearPeriod(key: string, fiscalYearStartMonth: number): Period {
  const start = requireFiscalYearStart(fiscalYearStartMonth);
  const match = typeof key === 'string' ? FISCAL_YEAR_KEY.exec(key) : null;
  if (!match) {
    throw new DomainError(
      'key',
      `A fiscal year must be written FY and the year it ends in, e.g. FY2026; got ${JSON.stringify(key)}.`,
    );
  }
  const endYear = Number(match[1]);
  const to = start === 1 ? monthKey(endYear, 12) : monthKey(endYear, start - 1);
  return periodOf('fiscal_year', key, addMonths(to, -11), to);
}

/** Any run of whole months, both ends included; key 'YYYY-MM..YYYY-MM'. */
export function customPeriod(from: MonthKey, to: MonthKey): Period {
  requireMonthKey('from', from);
  requireMonthKey('to', to);
  if (compareMonths(from, to) > 0) {
    throw new DomainError('to', `to (${to}) must not be earlier than from (${from}).`);
  }
  return periodOf('custom', `${from}..${to}`, from, to);
}

/** Reads a period from its kind and key (as in a URL or a snapshot row). */
export function parsePeriod(
  kind: Period['kind'],
  key: string,
  fiscalYearStartMonth: number,
): Period {
  switch (kind) {
    case 'month':
      if (!isMonthKey(key)) {
        throw new DomainError(
          'key',
          `A month must be written YYYY-MM; got ${JSON.stringify(key)}.`,
        );
      }
      return monthPeriod(key);
    case 'quarter':
      return quarterPeriod(key);
    case 'fiscal_year':
      return fiscalYearPeriod(key, fiscalYearStartMonth);
    case 'custom': {
      const match = typeof key === 'string' ? CUSTOM_KEY.exec(key) : null;
      if (!match) {
        throw new DomainError(
          'key',
          `A custom range must be written YYYY-MM..YYYY-MM; got ${JSON.stringify(key)}.`,
        );
      }
      return customPeriod(match[1], match[2]);
    }
    default:
      throw new DomainError(
        'kind',
        `kind must be one of ${[...PERIOD_KINDS, 'custom'].join(', ')}; got ${JSON.stringify(kind)}.`,
      );
  }
}

/** The calendar quarter a month falls in. */
export function quarterOf(month: MonthKey): Period {
  requireMonthKey('month', month);
  const quarter = Math.floor((Number(month.slice(5)) - 1) / 3) + 1;
  return quarterPeriod(`${month.slice(0, 4)}-Q${quarter}`);
}

/** The fiscal year a month falls in. */
export function fiscalYearOf(month: MonthKey, fiscalYearStartMonth: number): Period {
  requireMonthKey('month', month);
  const start = requireFiscalYearStart(fiscalYearStartMonth);
  const year = Number(month.slice(0, 4));
  const endYear = start === 1 || Number(month.slice(5)) < start ? year : year + 1;
  return fiscalYearPeriod(`FY${endYear}`, start);
}

/** The stored periods a month belongs to, smallest first: its month, quarter and fiscal year. */
export function periodsContaining(month: MonthKey, fiscalYearStartMonth: number): Period[] {
  return [monthPeriod(month), quarterOf(month), fiscalYearOf(month, fiscalYearStartMonth)];
}

/** The period just before, of the same kind; a custom range gets one of the same length. */
export function previousPeriod(period: Period, fiscalYearStartMonth: number): Period {
  switch (period.kind) {
    case 'month':
      return monthPeriod(addMonths(period.from, -1));
    case 'quarter':
      return quarterOf(addMonths(period.from, -1));
    case 'fiscal_year':
      return fiscalYearOf(addMonths(period.from, -1), fiscalYearStartMonth);
    case 'custom': {
      const length = monthsBetween(period.from, period.to).length;
      return customPeriod(addMonths(period.from, -length), addMonths(period.from, -1));
    }
  }
}

/** Every month of the period, oldest first. */
export function monthsOf(period: Pick<Period, 'from' | 'to'>): MonthKey[] {
  return monthsBetween(requireMonthKey('from', period.from), requireMonthKey('to', period.to));
}

/** First and last calendar day, as the snapshot rows store them (period_from, period_to). */
export function periodDates(period: Pick<Period, 'from' | 'to'>): {
  fromDate: string;
  toDate: string;
} {
  return { fromDate: monthStart(period.from), toDate: monthEnd(period.to) };
}

/** True for the kinds stored as snapshots (custom ranges are built from month snapshots). */
export function isStoredPeriodKind(kind: unknown): kind is PeriodKind {
  return typeof kind === 'string' && (PERIOD_KINDS as readonly string[]).includes(kind);
}
