/**
 * Stable keys that name one figure's scope and period, printed in the impact pack's "Trace
 * reference" column so that the trace (issue #8) can lead from a row back to its tallies.
 *
 * Shape: `network:<periodKey>`, `region:<id>:<periodKey>`, `chapter:<id>:<periodKey>`, where the
 * period key is the snapshot's own: 'YYYY-MM', 'YYYY-Qn', 'FY2026' or 'YYYY-MM..YYYY-MM'.
 */
import type { SnapshotScope } from '@tallyloom/core';

const PERIOD_KEY = /^(\d{4}-(0[1-9]|1[0-2])|\d{4}-Q[1-4]|FY\d{4}|\d{4}-\d{2}\.\.\d{4}-\d{2})$/;

export function traceReference(
  scope: SnapshotScope,
  scopeId: number | null,
  periodKey: string,
): string {
  if (!PERIOD_KEY.test(periodKey)) {
    throw new RangeError(`periodKey is not a period key: ${JSON.stringify(periodKey)}.`);
  }
  if (scope === 'network') return `network:${periodKey}`;
  if (scopeId === null || !Number.isInteger(scopeId) || scopeId < 1) {
    throw new RangeError(`A ${scope} trace reference needs a positive id; got ${String(scopeId)}.`);
  }
  return `${scope}:${scopeId}:${periodKey}`;
}

export interface ParsedTraceReference {
  scope: SnapshotScope;
  scopeId: number | null;
  periodKey: string;
}

/** The inverse of traceReference; null for anything it would not have written. */
export function parseTraceReference(reference: string): ParsedTraceReference | null {
  const match = /^(?:network|(region|chapter):(\d+)):(.+)$/.exec(reference);
  if (!match || !PERIOD_KEY.test(match[3])) return null;
  if (!match[1]) {
    return reference.startsWith('network:')
      ? { scope: 'network', scopeId: null, periodKey: match[3] }
      : null;
  }
  return { scope: match[1] as SnapshotScope, scopeId: Number(match[2]), periodKey: match[3] };
}
