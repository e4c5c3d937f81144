import type { SnapshotView } from '@tallyloom/core';
import { chartBase, valueAxisLabel, type DashboardChartOption } from './chart-option';
import { CHART_MEASURES, MEASURE_COLOURS, MEASURE_LABELS } from './measures';

/** The regions (or chapters) side by side; bar i belongs to breakdown[i], for the drill-down. */
export function buildBreakdownOption(breakdown: SnapshotView[]): DashboardChartOption {
  // ECharts draws a category axis from the bottom up: reversed, the list reads top to bottom.
  const rows = [...breakdown].reverse();
  return {
    ...chartBase,
    tooltip: { ...chartBase.tooltip, trigger: 'axis', axisPointer: { type: 'shadow' } },
    grid: { left: 8, right: 24, top: 40, bottom: 8, containLabel: true },
    xAxis: { type: 'value', axisLabel: valueAxisLabel },
    yAxis: { type: 'category', data: rows.map((row) => row.scopeName) },
    series: CHART_MEASURES.map((measure) => ({
      name: MEASURE_LABELS[measure],
      type: 'bar' as const,
      data: rows.map((row) => row.figures[measure]),
      itemStyle: { color: MEASURE_COLOURS[measure] },
      cursor: 'pointer',
    })),
  };
}

/** The breakdown row a click on bar `dataIndex` stands for (the bars are drawn reversed). */
export function breakdownAt(
  breakdown: SnapshotView[],
  dataIndex: number,
): SnapshotView | undefined {
  return breakdown[breakdown.length - 1 - dataIndex];
}
