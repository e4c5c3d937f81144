import type { ComplianceFigures } from '@tallyloom/core';
import { formatCount } from '@/lib/format';
import { chartBase, valueAxisLabel, type DashboardChartOption } from './chart-option';

export const COMPLIANCE_PARTS = ['onTime', 'late', 'missing', 'open'] as const;
export type CompliancePart = (typeof COMPLIANCE_PARTS)[number];

export const COMPLIANCE_LABELS: Record<CompliancePart, string> = {
  onTime: 'On time',
  late: 'Late',
  missing: 'Missing',
  open: 'Open',
};

/** One meaning each: filed on time, filed late, not filed and overdue, not due yet. */
export const COMPLIANCE_COLOURS: Record<CompliancePart, string> = {
  onTime: '#2E7D4F',
  late: '#B7791F',
  missing: '#B3261E',
  open: '#A19F9D',
};

export interface ComplianceRow {
  name: string;
  compliance: ComplianceFigures;
}

/** Chapter-months by how they were filed, one stacked bar per region (or chapter). */
export function buildComplianceOption(rows: ComplianceRow[]): DashboardChartOption {
  const drawn = [...rows].reverse();
  return {
    ...chartBase,
    tooltip: { ...chartBase.tooltip, trigger: 'axis', axisPointer: { type: 'shadow' } },
    grid: { left: 8, right: 24, top: 40, bottom: 8, containLabel: true },
    xAxis: { type: 'value', axisLabel: valueAxisLabel, minInterval: 1 },
    yAxis: { type: 'category', data: drawn.map((row) => row.name) },
    series: COMPLIANCE_PARTS.map((part) => ({
      name: COMPLIANCE_LABELS[part],
      type: 'bar' as const,
      stack: 'compliance',
      data: drawn.map((row) => row.compliance[part]),
      itemStyle: { color: COMPLIANCE_COLOURS[part] },
    })),
  };
}

export function describeCompliance(row: ComplianceRow): string {
  const parts = COMPLIANCE_PARTS.map(
    (part) => `${formatCount(row.compliance[part])} ${COMPLIANCE_LABELS[part].toLowerCase()}`,
  );
  return `${row.name}: ${formatCount(row.compliance.expected)} tallies expected; ${parts.join(', ')}.`;
}
