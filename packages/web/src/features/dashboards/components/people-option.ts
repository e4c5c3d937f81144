import { PEOPLE_GROUP_LABELS, PEOPLE_GROUPS, type PeopleGroup } from '@tallyloom/core';
import { formatFigure } from '@/lib/format';
import { chartBase, valueAxisLabel, type DashboardChartOption } from './chart-option';
import { MEASURE_COLOURS, MEASURE_LABELS } from './measures';

/** People served by group: one colour (people served), the groups named on the axis. */
export function buildPeopleOption(byGroup: Record<PeopleGroup, number>): DashboardChartOption {
  return {
    ...chartBase,
    legend: { show: false },
    tooltip: { ...chartBase.tooltip, trigger: 'axis', axisPointer: { type: 'shadow' } },
    grid: { left: 8, right: 24, top: 8, bottom: 8, containLabel: true },
    xAxis: { type: 'value', axisLabel: valueAxisLabel },
    yAxis: {
      type: 'category',
      data: [...PEOPLE_GROUPS].reverse().map((g) => PEOPLE_GROUP_LABELS[g]),
    },
    series: [
      {
        name: MEASURE_LABELS.peopleServed,
        type: 'bar',
        data: [...PEOPLE_GROUPS].reverse().map((group) => byGroup[group] ?? 0),
        itemStyle: { color: MEASURE_COLOURS.peopleServed },
        label: {
          show: true,
          position: 'right',
          formatter: ({ value }) => formatFigure(Number(value)),
        },
      },
    ],
  };
}

export function describePeople(byGroup: Record<PeopleGroup, number>): string {
  const parts = PEOPLE_GROUPS.map(
    (group) => `${PEOPLE_GROUP_LABELS[group]} ${formatFigure(byGroup[group] ?? 0)}`,
  );
  return `People served by group: ${parts.join(', ')}.`;
}
