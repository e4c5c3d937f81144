import type { BarSeriesOption, LineSeriesOption } from 'echarts/charts';
import type {
  GridComponentOption,
  LegendComponentOption,
  TooltipComponentOption,
} from 'echarts/components';
import type { ComposeOption } from 'echarts/core';
import { formatFigure } from '@/lib/format';

/** Only what the dashboards register with ECharts (register-charts.ts). */
export type DashboardChartOption = ComposeOption<
  | BarSeriesOption
  | LineSeriesOption
  | GridComponentOption
  | LegendComponentOption
  | TooltipComponentOption
>;

/** Shared by every dashboard chart: the loaded face, no animation, thousands separators. */
export const chartBase = {
  animation: false,
  // The canvas draws its text once: name the face that is loaded before the first render.
  textStyle: { fontFamily: 'Roboto, sans-serif' },
  legend: { top: 0, left: 0 },
  tooltip: {
    valueFormatter: (value: unknown) => (typeof value === 'number' ? formatFigure(value) : '—'),
  },
} satisfies DashboardChartOption;

export const valueAxisLabel = {
  formatter: (value: number) => formatFigure(value),
};
