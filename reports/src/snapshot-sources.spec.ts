import { fiscalYearPeriod, monthPeriod, quarterPeriod } from '@tallyloom/core';
import { mergeSources, namesOwnSources, sourcesOfStoredSql } from './snapshot-sources';

describe('namesOwnSources', () => {
  it("is true for a region's month and a chapter's periods only", () => {
    expect(namesOwnSources({ scope: 'region', period: monthPeriod('2026-01') })).toBe(true);
    expect(namesOwnSources({ scope: 'chapter', period: quarterPeriod('2026-Q1') })).toBe(true);
    expect(namesOwnSources({ scope: 'region', period: quarterPeriod('2026-Q1') })).toBe(false);
    expect(namesOwnSources({ scope: 'network', period: monthPeriod('2026-01') })).toBe(false);
  });
});

describe('sourcesOfStoredSql', () => {
  it("reads a region's own months of the period", () => {
    const query = sourcesOfStoredSql('region', 4, quarterPeriod('2026-Q1'));
    expect(query.sql).toContain('scope_id = :regionId');
    expect(query.replacements).toEqual({ months: ['2026-01', '2026-02', '2026-03'], regionId: 4 });
  });

  it("reads every region's months for the network, a fiscal year's twelve", () => {
    const query = sourcesOfStoredSql('network', 0, fiscalYearPeriod('FY2026', 7));
    expect(query.sql).not.toContain(':regionId');
    const months = query.replacements.months as string[];
    expect([months.length, months[0], months.at(-1)]).toEqual([12, '2025-07', '2026-06']);
  });
});

describe('mergeSources', () => {
  it('joins the lists of several months and regions in tally order', () => {
    expect(
      mergeSources([
        [
          [7, 1],
          [30, 2],
        ],
        [],
        [
          [3, 4],
          [12, 1],
        ],
      ]),
    ).toEqual([
      [3, 4],
      [7, 1],
      [12, 1],
      [30, 2],
    ]);
  });
});
