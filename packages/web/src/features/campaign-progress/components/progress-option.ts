import type { LineSeriesOption } from 'echarts/charts';
import type {
  GridComponentOption,
  LegendComponentOption,
  TooltipComponentOption,
} from 'echarts/components';
import type { ComposeOption } from 'echarts/core';
import type { CampaignProgressView, PublicCampaignProgress } from '@tallyloom/core';
import { formatCount, formatDate } from '@/lib/format';

export type ProgressOption = ComposeOption<
  LineSeriesOption | GridComponentOption | LegendComponentOption | TooltipComponentOption
>;

export type ProgressInput = Pick<
  PublicCampaignProgress,
  'goalPanels' | 'startsOn' | 'endsOn' | 'weekly' | 'creditedPanels'
> & {
  /** Left out on the public page, which shows counts only. */
  projection?: CampaignProgressView['projection'];
};

/** One meaning per colour: credited so far, the goal, the projection (dashed, same family). */
export const PROGRESS_COLOURS = {
  credited: '#0F5C5E',
  goal: '#B3261E',
  projection: '#6B9C9C',
} as const;

export const SERIES_NAMES = {
  credited: 'Credited panels (cumulative)',
  goal: 'Goal',
  projection: 'Projection',
} as const;

/** Credited panels week by week, the goal as a flat line, and where the projection ends. */
export function buildProgressOption(input: ProgressInput): ProgressOption {
  const credited = input.weekly.map((week) => [week.weekStart, week.cumulative]);
  const last = input.weekly.at(-1);
  const series: LineSeriesOption[] = [
    {
      name: SERIES_NAMES.credited,
      type: 'line',
      data: credited,
      symbol: 'circle',
      symbolSize: 5,
      lineStyle: { color: PROGRESS_COLOURS.credited, width: 2 },
      itemStyle: { color: PROGRESS_COLOURS.credited },
    },
    {
      name: SERIES_NAMES.goal,
      type: 'line',
      data: [
        [input.startsOn, input.goalPanels],
        [input.endsOn, input.goalPanels],
      ],
      symbol: 'none',
      lineStyle: { color: PROGRESS_COLOURS.goal, type: 'dashed', width: 1.5 },
      itemStyle: { color: PROGRESS_COLOURS.goal },
    },
  ];
  if (input.projection) {
    series.push({
      name: SERIES_NAMES.projection,
      type: 'line',
      data: [
        [last?.weekStart ?? input.startsOn, last?.cumulative ?? 0],
        [input.endsOn, input.projection.panelsAtEnd],
      ],
      symbol: 'none',
      lineStyle: { color: PROGRESS_COLOURS.projection, type: 'dotted', width: 2 },
      itemStyle: { color: PROGRESS_COLOURS.projection },
    });
  }
  return {
    animation: false,
    textStyle: { fontFamily: 'Roboto, sans-serif' },
    legend: { top: 0, left: 0 },
    tooltip: {
      trigger: 'axis',
      valueFormatter: (value) => (typeof value === 'number' ? formatCount(value) : '—'),
    },
    grid: { left: 8, right: 24, top: 40, bottom: 8, containLabel: true },
    xAxis: { type: 'time', min: input.startsOn, max: input.endsOn },
    yAxis: { type: 'value', axisLabel: { formatter: (value: number) => formatCount(value) } },
    series,
  };
}

/** The chart in words. */
export function describeProgress(input: ProgressInput): string {
  const parts = [
    `${formatCount(input.creditedPanels)} of ${formatCount(input.goalPanels)} panels credited over ${input.weekly.length} weeks since ${formatDate(input.startsOn)}`,
  ];
  if (input.projection) {
    parts.push(
      `projected ${formatCount(input.projection.panelsAtEnd)} by ${formatDate(input.endsOn)}`,
    );
  }
  return `Campaign progress: ${parts.join('; ')}.`;
}
