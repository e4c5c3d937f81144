import {
  addMonths,
  customPeriod,
  DomainError,
  isMonthKey,
  monthsBetween,
  parsePeriod,
  periodsContaining,
  PERIOD_KINDS,
  type MonthKey,
  type Period,
} from '@tallyloom/core';
import { invalidField } from '../common/validation/field-errors';

/** Longest custom range a dashboard combines from month snapshots (three years). */
export const MAX_CUSTOM_MONTHS = 36;

export const DASHBOARD_PERIOD_KINDS = [...PERIOD_KINDS, 'custom'] as const;
export type DashboardPeriodKind = (typeof DASHBOARD_PERIOD_KINDS)[number];

export interface PeriodQuery {
  periodKind?: string;
  period?: string;
  from?: string;
  to?: string;
}

/**
 * Turns the dashboard's query into a period. Without a period key it is the one of that kind
 * holding the last complete month; without a kind, the key's own shape says which it is.
 * Bad input is a 400 that names the field.
 */
export function resolvePeriod(
  query: PeriodQuery,
  fiscalYearStartMonth: number,
  lastCompleteMonth: MonthKey,
): Period {
  const kind = kindOf(query);
  if (kind === 'custom') return customRange(query);
  if (query.period === undefined || query.period === '') {
    const containing = periodsContaining(lastCompleteMonth, fiscalYearStartMonth);
    const period = containing.find((candidate) => candidate.kind === kind);
    if (!period) throw new Error(`periodsContaining gave no ${kind} period`);
    return period;
  }
  try {
    return parsePeriod(kind, query.period, fiscalYearStartMonth);
  } catch (error) {
    if (error instanceof DomainError) throw invalidField('period', error.message);
    throw error;
  }
}

function kindOf(query: PeriodQuery): DashboardPeriodKind {
  const given = query.periodKind;
  if (given !== undefined && given !== '') {
    if (!(DASHBOARD_PERIOD_KINDS as readonly string[]).includes(given))
      throw invalidField(
        'periodKind',
        `periodKind must be one of: ${DASHBOARD_PERIOD_KINDS.join(', ')}.`,
      );
    return given as DashboardPeriodKind;
  }
  if (query.from !== undefined || query.to !== undefined) return 'custom';
  const key = query.period ?? '';
  if (/^FY/i.test(key)) return 'fiscal_year';
  if (/-Q/i.test(key)) return 'quarter';
  return 'month';
}

function customRange(query: PeriodQuery): Period {
  const from = monthField('from', query.from);
  const to = monthField('to', query.to);
  if (from > to) throw invalidField('to', `to (${to}) must not be before from (${from}).`);
  // A range of 36 months ends 35 months after it starts.
  if (to > addMonths(from, MAX_CUSTOM_MONTHS - 1))
    throw invalidField(
      'to',
      `A custom range may span at most ${MAX_CUSTOM_MONTHS} months; ${from} to ${to} spans ${monthsBetween(from, to).length}.`,
    );
  return customPeriod(from, to);
}

function monthField(field: 'from' | 'to', value: string | undefined): MonthKey {
  if (value === undefined || value === '')
    throw invalidField(field, `${field} is required for a custom range (YYYY-MM).`);
  if (!isMonthKey(value)) throw invalidField(field, `${field} must be a month as YYYY-MM.`);
  return value;
}
