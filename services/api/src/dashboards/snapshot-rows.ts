import type { ComplianceFigures, SnapshotFigures, SnapshotScope } from '@tallyloom/core';

/** One stored report snapshot as the dashboards read it. */
export interface SnapshotRow {
  scope: SnapshotScope;
  /** 0 for the network. */
  scopeId: number;
  periodKind: 'month' | 'quarter' | 'fiscal_year';
  periodKey: string;
  figures: SnapshotFigures;
  compliance: ComplianceFigures;
  pendingTallies: number;
  asOf: string;
}

/** JSON columns arrive as text or parsed, depending on the driver's column metadata. */
export function jsonColumn<T>(value: unknown): T {
  return (typeof value === 'string' ? JSON.parse(value) : value) as T;
}

/** A DATETIME read at the connection's UTC time zone, as an ISO timestamp. */
export function isoTimestamp(value: unknown): string {
  if (value instanceof Date) return value.toISOString();
  const text = String(value);
  return new Date(
    /[zZ]|[+-]\d\d:?\d\d$/.test(text) ? text : `${text.replace(' ', 'T')}Z`,
  ).toISOString();
}

/** A DATE column as YYYY-MM-DD. */
export function isoDate(value: unknown): string {
  return value instanceof Date ? value.toISOString().slice(0, 10) : String(value).slice(0, 10);
}
