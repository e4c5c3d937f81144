import { monthLabel, PEOPLE_GROUPS, PEOPLE_GROUP_LABELS } from '@tallyloom/core';
import type { EChartsOption } from 'echarts';
import type { ImpactPackData } from '../impact-pack-data';
import { renderChart, type RenderedChart } from './render-chart';

/** One meaning per colour across the pack's charts (BRIEF §10): teal panels, ember blankets. */
const COLOURS = { panels: '#0f6b6b', blankets: '#c2571a', people: '#4a5a8c' };
const SIZE = { width: 900, height: 380 };

export interface ImpactChart extends RenderedChart {
  title: string;
}

const base = (title: string): EChartsOption => ({
  title: { text: title, left: 'center', textStyle: { fontSize: 16 } },
  legend: { bottom: 0 },
  grid: { left: 70, right: 30, top: 50, bottom: 70 },
  yAxis: { type: 'value' },
});

/** Panels received and blankets given by month. */
export function monthlyTrendOption(data: ImpactPackData): {
  title: string;
  option: EChartsOption;
} {
  const title = `Panels received and blankets given by month · ${data.period.label}`;
  return {
    title,
    option: {
      ...base(title),
      xAxis: { type: 'category', data: data.byMonth.map((row) => monthLabel(row.label)) },
      series: [
        {
          name: 'Panels received',
          type: 'bar',
          color: COLOURS.panels,
          data: data.byMonth.map((row) => row.figures.panelsAccepted),
        },
        {
          name: 'Blankets given',
          type: 'line',
          color: COLOURS.blankets,
          data: data.byMonth.map((row) => row.figures.blanketsGiven),
        },
      ],
    },
  };
}

/** Blankets given by region (network) or chapter (region). */
export function byScopeOption(data: ImpactPackData): { title: string; option: EChartsOption } {
  const title = `Blankets given by ${data.childScope} · ${data.period.label}`;
  return {
    title,
    option: {
      ...base(title),
      xAxis: {
        type: 'category',
        data: data.byChild.map((row) => row.label),
        axisLabel: { interval: 0, rotate: data.byChild.length > 6 ? 30 : 0 },
      },
      series: [
        {
          name: 'Blankets given',
          type: 'bar',
          color: COLOURS.blankets,
          data: data.byChild.map((row) => row.figures.blanketsGiven),
        },
      ],
    },
  };
}

export function peopleByGroupOption(data: ImpactPackData): {
  title: string;
  option: EChartsOption;
} {
  const title = `People served by group · ${data.period.label}`;
  return {
    title,
    option: {
      ...base(title),
      xAxis: { type: 'category', data: PEOPLE_GROUPS.map((group) => PEOPLE_GROUP_LABELS[group]) },
      series: [
        {
          name: 'People served',
          type: 'bar',
          color: COLOURS.people,
          data: PEOPLE_GROUPS.map((group) => data.headline.peopleServedByGroup[group]),
        },
      ],
    },
  };
}

/** The pack's three charts, drawn to PNG. */
export function impactCharts(data: ImpactPackData): ImpactChart[] {
  return [monthlyTrendOption, byScopeOption, peopleByGroupOption].map((build) => {
    const { title, option } = build(data);
    return { title, ...renderChart(option, SIZE) };
  });
}
