import type { SnapshotView } from '@tallyloom/core';
import { formatFigure } from '@/lib/format';
import { chartBase, valueAxisLabel, type DashboardChartOption } from './chart-option';
import { CHART_MEASURES, MEASURE_COLOURS, MEASURE_LABELS } from './measures';

/** Panels received, blankets made and given, month by month. */
export function buildTrendOption(trend: SnapshotView[]): DashboardChartOption {
  return {
    ...chartBase,
    tooltip: { ...chartBase.tooltip, trigger: 'axis' },
    grid: { left: 8, right: 16, top: 40, bottom: 8, containLabel: true },
    xAxis: { type: 'category', data: trend.map((point) => point.period.label) },
    yAxis: { type: 'value', axisLabel: valueAxisLabel },
    series: CHART_MEASURES.map((measure) => ({
      name: MEASURE_LABELS[measure],
      type: 'line' as const,
      data: trend.map((point) => point.figures[measure]),
      symbol: 'circle',
      lineStyle: { color: MEASURE_COLOURS[measure] },
      itemStyle: { color: MEASURE_COLOURS[measure] },
    })),
  };
}

/** The trend in words: first and last month of each line. */
export function describeTrend(trend: SnapshotView[]): string {
  const first = trend[0];
  const last = trend.at(-1);
  if (!first || !last) return 'Monthly trend: no months to show.';
  const lines = CHART_MEASURES.map(
    (measure) =>
      `${MEASURE_LABELS[measure]} ${formatFigure(first.figures[measure])} in ${first.period.label}, ${formatFigure(last.figures[measure])} in ${last.period.label}`,
  );
  return `Monthly trend, ${trend.length} months: ${lines.join('; ')}.`;
}
