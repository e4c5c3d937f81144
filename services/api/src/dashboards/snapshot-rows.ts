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
