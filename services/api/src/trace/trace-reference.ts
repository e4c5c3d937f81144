import {
  DomainError,
  parsePeriod,
  parseTraceReference,
  traceReference,
  type Period,
  type SnapshotScope,
} from '@tallyloom/core';
import { invalidField } from '../common/validation/field-errors';

/** The scope and stored period a trace reference names. */
export interface TraceTarget {
  /** The reference written back in its canonical form. */
  reference: string;
  scope: SnapshotScope;
  /** Null for the network. */
  scopeId: number | null;
  period: Period;
}

const SHAPE =
  "A trace reference looks like 'network:FY2026', 'region:3:2026-Q1' or 'chapter:12:2025-07'.";

/**
 * Reads a trace reference (core's reporting/trace-reference.ts). Only the stored period kinds can be
 * traced: a custom range has no snapshot row whose source revisions could be listed. Anything
 * else is a 400 that names `reference`.
 */
export function traceTargetOf(reference: string, fiscalYearStartMonth: number): TraceTarget {
  const parsed = parseTraceReference(reference);
  if (!parsed) throw invalidField('reference', SHAPE);
  const { scope, scopeId, periodKey } = parsed;
  if (periodKey.includes('..')) {
    throw invalidField(
      'reference',
      `A custom range (${periodKey}) is not traceable: trace its months, quarters or fiscal year.`,
    );
  }
  if (scopeId !== null && scopeId < 1) throw invalidField('reference', SHAPE);
  const kind = periodKey.startsWith('FY')
    ? 'fiscal_year'
    : periodKey.includes('-Q')
      ? 'quarter'
      : 'month';
  let period: Period;
  try {
    period = parsePeriod(kind, periodKey, fiscalYearStartMonth);
  } catch (error) {
    if (error instanceof DomainError) throw invalidField('reference', error.message);
    throw error;
  }
  return { reference: traceReference(scope, scopeId, period.key), scope, scopeId, period };
}
