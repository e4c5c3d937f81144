import { describe, expect, it } from 'vitest';
import { springCampaign } from '@/testing/report-fixtures';
import { buildProgressOption, PROGRESS_COLOURS, SERIES_NAMES } from './progress-option';
import { formatPace, neededWords, projectionWords } from './progress-words';

type Series = Array<{ name?: string; data?: unknown[]; lineStyle?: { color?: string } }>;

describe('campaign progress chart', () => {
  it('draws the cumulative credited panels, the goal across the run and the projection to the end', () => {
    const option = buildProgressOption(springCampaign);
    const series = option.series as Series;
    expect(series.map((line) => line.name)).toEqual([
      SERIES_NAMES.credited,
      SERIES_NAMES.goal,
      SERIES_NAMES.projection,
    ]);
    expect(series[0]?.data?.at(-1)).toEqual(['2026-03-30', 1_300]);
    expect(series[1]?.data).toEqual([
      ['2026-03-02', 4_000],
      ['2026-05-24', 4_000],
    ]);
    expect(series[2]?.data).toEqual([
      ['2026-03-30', 1_300],
      ['2026-05-24', 3_120],
    ]);
    expect(series[1]?.lineStyle?.color).toBe(PROGRESS_COLOURS.goal);
    expect(option.xAxis).toMatchObject({ type: 'time', min: '2026-03-02', max: '2026-05-24' });
  });

  it('leaves the projection out where there is none (the public page)', () => {
    const series = buildProgressOption({ ...springCampaign, projection: undefined })
      .series as Series;
    expect(series.map((line) => line.name)).toEqual([SERIES_NAMES.credited, SERIES_NAMES.goal]);
  });
});

describe('campaign progress in words', () => {
  it('reads the pace to one decimal: issue #6’s 2,700 panels over 7 weeks', () => {
    // 2,700 / 7 = 385.714… (worked by hand in issue #6).
    expect(formatPace(2_700 / 7)).toBe('385.7');
    expect(neededWords(springCampaign)).toBe('385.7 panels a week');
  });

  it('says when the goal is met or the run is over instead of a pace', () => {
    expect(neededWords({ ...springCampaign, creditedPanels: 4_100, neededPerWeek: 0 })).toBe(
      'Goal met',
    );
    expect(neededWords({ ...springCampaign, neededPerWeek: null })).toBe('The campaign has ended');
  });

  it('names the projection’s method and when the goal is met', () => {
    expect(
      projectionWords({
        ...springCampaign,
        projection: { ...springCampaign.projection, panelsAtEnd: 4_300, goalMetOn: '2026-05-11' },
      }),
    ).toBe(
      'About 4,300 panels by 24 May 2026, the goal of 4,000 met on 11 May 2026. Method: least-squares line over the last 5 weeks of credited panels.',
    );
  });
});
