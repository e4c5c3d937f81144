import type { LineSeriesOption } from 'echarts/charts';
import type { GridComponentOption, TooltipComponentOption } from 'echarts/components';
import type { ComposeOption } from 'echarts/core';
import { compareMonths, monthLabel, monthsBetween, type MonthKey } from '@tallyloom/core';
import { formatFigure } from '@/lib/format';
import { emberAccent, tallyloomBrandRamp } from '@/theme/brand-ramp';

/** Only what the sparkline registers with ECharts: a line chart on a grid, with a tooltip. */
export type SparklineOption = ComposeOption<
  LineSeriesOption | GridComponentOption | TooltipComponentOption
>;

export interface SparklineInput {
  /** The count in words, e.g. "Blankets given out". */
  label: string;
  /** The month under review. */
  month: MonthKey;
  /** Its value in the tally under review. */
  value: number;
  /** The chapter's approved months, any order. */
  history: Array<{ month: MonthKey; value: number }>;
}

/** One meaning per colour: teal is the approved history, ember this month under review. */
export const SPARKLINE_COLOURS = {
  history: tallyloomBrandRamp[80],
  thisMonth: emberAccent,
} as const;

export const HISTORY_SERIES_NAME = 'Approved months';
export const THIS_MONTH_SERIES_NAME = 'This month';

/**
 * Every calendar month from the earliest to the latest shown, so a month without an approved
 * tally leaves a gap in the line instead of being silently skipped.
 */
export function sparklineMonths(input: SparklineInput): MonthKey[] {
  const months = [input.month, ...input.history.map((point) => point.month)].sort(compareMonths);
  return monthsBetween(months[0] ?? input.month, months.at(-1) ?? input.month);
}

/** The ECharts option for one headline count: a bare line, with this month as a marked point. */
export function buildSparklineOption(input: SparklineInput): SparklineOption {
  const months = sparklineMonths(input);
  const byMonth = new Map(input.history.map((point) => [point.month, point.value]));
  const history = months.map((month) => byMonth.get(month) ?? null);
  const thisMonth = months.map((month) => (month === input.month ? input.value : null));

  return {
    animation: false,
    // The canvas draws its text once: name the face that is loaded before the first render.
    textStyle: { fontFamily: 'Roboto, sans-serif' },
    grid: { left: 4, right: 8, top: 6, bottom: 6 },
    xAxis: {
      type: 'category',
      data: months.map(monthLabel),
      show: false,
      boundaryGap: false,
    },
    // Scaled to the figures shown, this month included, so the shape of the history is visible.
    yAxis: { type: 'value', show: false, scale: true },
    tooltip: {
      trigger: 'axis',
      axisPointer: { type: 'line' },
      valueFormatter: (value) => (typeof value === 'number' ? formatFigure(value) : '—'),
    },
    series: [
      {
        name: HISTORY_SERIES_NAME,
        type: 'line',
        data: history,
        // A month with no approved tally breaks the line rather than bridging it.
        connectNulls: false,
        symbol: 'circle',
        symbolSize: 3,
        lineStyle: { width: 1.5, color: SPARKLINE_COLOURS.history },
        itemStyle: { color: SPARKLINE_COLOURS.history },
      },
      {
        name: THIS_MONTH_SERIES_NAME,
        type: 'line',
        data: thisMonth,
        symbol: 'circle',
        symbolSize: 8,
        itemStyle: { color: SPARKLINE_COLOURS.thisMonth },
        z: 3,
      },
    ],
  };
}

/** The chart in words, for screen readers and for anyone who cannot tell the colours apart. */
export function describeSparkline(input: SparklineInput): string {
  const thisMonth = `${input.label}: ${formatFigure(input.value)} in ${monthLabel(input.month)}`;
  if (input.history.length === 0) return `${thisMonth}; no approved months to compare with yet.`;
  const months = input.history.map((point) => point.month).sort(compareMonths);
  const values = input.history.map((point) => point.value);
  const first = monthLabel(months[0] ?? input.month);
  const last = monthLabel(months.at(-1) ?? input.month);
  const span = first === last ? first : `${first} to ${last}`;
  const low = formatFigure(Math.min(...values));
  const high = formatFigure(Math.max(...values));
  if (months.length === 1) return `${thisMonth}; 1 approved month (${span}): ${low}.`;
  const spread = low === high ? `${low} each` : `from ${low} to ${high}`;
  return `${thisMonth}; ${months.length} approved months (${span}): ${spread}.`;
}
