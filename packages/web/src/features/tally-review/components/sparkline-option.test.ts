import { describe, expect, it } from 'vitest';
import {
  buildSparklineOption,
  describeSparkline,
  HISTORY_SERIES_NAME,
  SPARKLINE_COLOURS,
  sparklineMonths,
  THIS_MONTH_SERIES_NAME,
  type SparklineInput,
} from './sparkline-option';

const input: SparklineInput = {
  label: 'Blankets given out',
  month: '2026-03',
  value: 60,
  history: [
    { month: '2025-11', value: 12 },
    { month: '2025-10', value: 14 },
    // December is missing: no approved tally that month.
    { month: '2026-01', value: 13 },
    { month: '2026-02', value: 15 },
  ],
};

function seriesOf(option: ReturnType<typeof buildSparklineOption>) {
  const series = option.series;
  if (!Array.isArray(series)) throw new Error('expected a list of series');
  return series as Array<{
    name: string;
    type: string;
    data: Array<number | null>;
    itemStyle: { color: string };
  }>;
}

describe('the history sparkline option', () => {
  it('spans every calendar month from the oldest approved one to this month', () => {
    expect(sparklineMonths(input)).toEqual([
      '2025-10',
      '2025-11',
      '2025-12',
      '2026-01',
      '2026-02',
      '2026-03',
    ]);
    const option = buildSparklineOption(input);
    const xAxis = option.xAxis as { data: string[] };
    // Scaled to the figures, not from 0, so a sparkline shows the shape of the history.
    expect(option.yAxis).toMatchObject({ scale: true });
    expect(xAxis.data).toEqual([
      'Oct 2025',
      'Nov 2025',
      'Dec 2025',
      'Jan 2026',
      'Feb 2026',
      'Mar 2026',
    ]);
  });

  it('draws the history in order with a gap for the missing month, and this month apart', () => {
    const [history, thisMonth] = seriesOf(buildSparklineOption(input));
    expect(history?.name).toBe(HISTORY_SERIES_NAME);
    expect(history?.type).toBe('line');
    expect(history?.data).toEqual([14, 12, null, 13, 15, null]);
    expect(thisMonth?.name).toBe(THIS_MONTH_SERIES_NAME);
    expect(thisMonth?.data).toEqual([null, null, null, null, null, 60]);
  });

  it('gives history and this month their own colours', () => {
    expect(SPARKLINE_COLOURS.history).not.toBe(SPARKLINE_COLOURS.thisMonth);
    const [history, thisMonth] = seriesOf(buildSparklineOption(input));
    expect(history?.itemStyle.color).toBe(SPARKLINE_COLOURS.history);
    expect(thisMonth?.itemStyle.color).toBe(SPARKLINE_COLOURS.thisMonth);
  });

  it('marks this month even when an amendment is older than some approved months', () => {
    const option = buildSparklineOption({
      ...input,
      month: '2025-12',
      value: 9,
      history: [
        { month: '2025-11', value: 12 },
        { month: '2026-01', value: 13 },
      ],
    });
    const [history, thisMonth] = seriesOf(option);
    expect(history?.data).toEqual([12, null, 13]);
    expect(thisMonth?.data).toEqual([null, 9, null]);
  });

  it('shows this month alone when the chapter has no approved month yet', () => {
    const option = buildSparklineOption({ ...input, history: [] });
    const [history, thisMonth] = seriesOf(option);
    expect(history?.data).toEqual([null]);
    expect(thisMonth?.data).toEqual([60]);
  });

  it('says in words what the chart shows', () => {
    expect(describeSparkline(input)).toBe(
      'Blankets given out: 60 in Mar 2026; 4 approved months (Oct 2025 to Feb 2026): from 12 to 15.',
    );
    expect(
      describeSparkline({ ...input, value: 212.5, label: 'Volunteer hours', history: [] }),
    ).toBe('Volunteer hours: 212.5 in Mar 2026; no approved months to compare with yet.');
    expect(describeSparkline({ ...input, history: [{ month: '2026-02', value: 1_500 }] })).toBe(
      'Blankets given out: 60 in Mar 2026; 1 approved month (Feb 2026): 1,500.',
    );
    const steady = [
      { month: '2026-01', value: 14 },
      { month: '2026-02', value: 14 },
    ];
    expect(describeSparkline({ ...input, history: steady })).toBe(
      'Blankets given out: 60 in Mar 2026; 2 approved months (Jan 2026 to Feb 2026): 14 each.',
    );
  });
});
