import {
  can,
  traceableReference,
  type Role,
  type SnapshotView,
  type TraceMeasure,
} from '@tallyloom/core';
import { paths } from '@/config/paths';

/**
 * The trace of one figure of a snapshot, or null: for roles without 'trace.read' (grant writers
 * see aggregates only), and for a custom range, which has no stored snapshot to trace.
 */
export function traceHref(
  role: Role | undefined,
  view: Pick<SnapshotView, 'scope' | 'scopeId' | 'period'>,
  measure: TraceMeasure,
): string | null {
  if (!can(role, 'trace.read')) return null;
  const reference = traceableReference(view.scope, view.scopeId, view.period);
  return reference ? paths.trace.getHref(reference, measure) : null;
}
