/** Small guards shared by the SQL builders: bad arguments fail loudly, never reach SQL. */
import type { MonthKey } from '@tallyloom/core';

export interface SqlQuery {
  sql: string;
  /** Named replacements (`:name`) for Sequelize's `query`. */
  replacements: Record<string, unknown>;
}

const MONTH_KEY = /^\d{4}-(0[1-9]|1[0-2])$/;

/** The first day of a 'YYYY-MM' month, as the DATE the tables store. */
export function monthStartDate(name: string, month: MonthKey): string {
  if (!MONTH_KEY.test(month)) {
    throw new RangeError(`${name} must be a month as YYYY-MM; got ${JSON.stringify(month)}.`);
  }
  return `${month}-01`;
}

/** Distinct ids, each a positive whole number. */
export function requireIds(name: string, ids: readonly number[]): number[] {
  const distinct = [...new Set(ids)];
  if (distinct.some((id) => !Number.isInteger(id) || id < 1)) {
    throw new RangeError(`${name} must be positive whole numbers; got ${JSON.stringify(ids)}.`);
  }
  return distinct;
}
