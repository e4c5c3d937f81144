import { describe, expect, it } from 'vitest';
import { networkDashboard } from '@/testing/report-fixtures';
import { breakdownAt, buildBreakdownOption } from './breakdown-option';
import { buildComplianceOption, COMPLIANCE_COLOURS } from './compliance-option';
import { MEASURE_COLOURS } from './measures';
import { buildPeopleOption } from './people-option';
import { buildTrendOption, describeTrend } from './trend-option';

type Series = Array<{
  name?: string;
  data?: unknown[];
  stack?: string;
  itemStyle?: { color?: string };
}>;

const view = networkDashboard();

describe('dashboard chart options', () => {
  it('draws the trend month by month, one colour per measure', () => {
    const option = buildTrendOption(view.trend);
    expect(option.xAxis).toMatchObject({ data: ['Feb 2026', 'Mar 2026'] });
    const series = option.series as Series;
    expect(series.map((line) => line.name)).toEqual([
      'Panels received',
      'Blankets made',
      'Blankets given',
    ]);
    expect(series[0]?.data).toEqual([1_000, 1_250]);
    expect(series[1]?.itemStyle?.color).toBe(MEASURE_COLOURS.blanketsAssembled);
    expect(describeTrend(view.trend)).toContain(
      'Panels received 1,000 in Feb 2026, 1,250 in Mar 2026',
    );
  });

  it('lists the regions top to bottom and maps a clicked bar back to its region', () => {
    const option = buildBreakdownOption(view.breakdown);
    // ECharts draws a category axis bottom up.
    expect(option.yAxis).toMatchObject({ data: ['Riverlands', 'North Ridge'] });
    expect((option.series as Series)[0]?.data).toEqual([480, 1_250]);
    expect(breakdownAt(view.breakdown, 0)?.scopeName).toBe('Riverlands');
    expect(breakdownAt(view.breakdown, 1)?.scopeName).toBe('North Ridge');
  });

  it('stacks on time, late, missing and open in their own colours', () => {
    const option = buildComplianceOption([
      { name: 'North Ridge', compliance: { expected: 5, onTime: 2, late: 1, missing: 1, open: 1 } },
    ]);
    const series = option.series as Series;
    expect(series.map((bar) => [bar.name, bar.data, bar.stack])).toEqual([
      ['On time', [2], 'compliance'],
      ['Late', [1], 'compliance'],
      ['Missing', [1], 'compliance'],
      ['Open', [1], 'compliance'],
    ]);
    expect(series[2]?.itemStyle?.color).toBe(COMPLIANCE_COLOURS.missing);
  });

  it('names every people group on the axis, zero when a group is missing', () => {
    const option = buildPeopleOption({
      infants: 4,
      children: 10,
      adults: 14,
      olderAdults: 8,
      disasterAffected: 2,
    });
    expect(option.yAxis).toMatchObject({
      data: ['Disaster-affected', 'Older adults', 'Adults', 'Children', 'Infants'],
    });
    expect((option.series as Series)[0]?.data).toEqual([2, 8, 14, 10, 4]);
  });
});
