/**
 * Stable keys that name one figure's scope and period (BRIEF §3 "Trace"; issue #8). The trace API
 * reads them, the web app builds its trace links with them, and the impact pack prints them on its
 * rows, so all three share this one format.
 *
 * Shape: `network:<periodKey>`, `region:<id>:<periodKey>`, `chapter:<id>:<periodKey>`, where the
 * period key is the snapshot's own: 'YYYY-MM', 'YYYY-Qn', 'FY2026' or 'YYYY-MM..YYYY-MM'.
 */
import type { Period, SnapshotScope } from '../contract/reports';

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

/**
 * The reference of a figure a person can trace, or null: only stored periods (month, quarter,
 * fiscal year) have a snapshot whose source revisions can be listed, so a custom range has none.
 */
export function traceableReference(
  scope: SnapshotScope,
  scopeId: number | null,
  period: Pick<Period, 'kind' | 'key'>,
): string | null {
  if (period.kind === 'custom') return null;
  return traceReference(scope, scopeId, period.key);
}

/**
 * The web app's path of a trace (its `/trace/:reference` route), for links written outside the
 * app such as the impact pack's rows; absent measure traces every measure.
 */
export function tracePath(reference: string, measure?: string): string {
  return `/trace/${encodeURIComponent(reference)}${measure ? `?measure=${encodeURIComponent(measure)}` : ''}`;
}
