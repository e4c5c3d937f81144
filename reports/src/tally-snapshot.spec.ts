import { emptySnapshotFigures, PEOPLE_GROUPS } from '@tallyloom/core';
import { chapterMonthFactsSql } from './chapter-month-facts';
import { PEOPLE_GROUP_COLUMNS, TALLY_MEASURES, TALLY_SNAPSHOT } from './tally-snapshot';

describe('the tally snapshot definition', () => {
  it('has exactly one measure for every figure of a snapshot', () => {
    const figureKeys = Object.keys(emptySnapshotFigures()).sort();
    expect(TALLY_MEASURES.map((measure) => measure.key).sort()).toEqual(figureKeys);
  });

  it('describes every measure in words and names the tally fields it reads', () => {
    for (const measure of TALLY_MEASURES) {
      expect(measure.label.length).toBeGreaterThan(3);
      expect(measure.description).toMatch(/^[A-Z].{20,}\.$/);
      expect(measure.reads.length).toBeGreaterThan(0);
      for (const field of measure.reads)
        expect(field).toMatch(/^(monthly_tallies|tally_\w+)\.\w+$/);
    }
  });

  it('keeps stock as a closing figure and everything else as a sum or count', () => {
    const closing = TALLY_MEASURES.filter((measure) => measure.aggregation === 'closing');
    expect(closing.map((measure) => measure.key).sort()).toEqual([
      'blanketsInStock',
      'panelsInStock',
    ]);
  });

  it('gives every measure a column in the facts query', () => {
    const { sql } = chapterMonthFactsSql();
    for (const measure of TALLY_MEASURES) {
      for (const column of measure.factColumns) expect(sql).toMatch(new RegExp(`\\b${column}\\b`));
    }
  });

  it('names one fact column per people group, in snake case', () => {
    expect(PEOPLE_GROUPS.map((group) => PEOPLE_GROUP_COLUMNS[group])).toEqual([
      'people_infants',
      'people_children',
      'people_adults',
      'people_older_adults',
      'people_disaster_affected',
    ]);
  });

  it('rolls up chapter → region → network and month → quarter → fiscal year', () => {
    expect(TALLY_SNAPSHOT.dimensions.scope).toEqual(['chapter', 'region', 'network']);
    expect(TALLY_SNAPSHOT.dimensions.period).toEqual(['month', 'quarter', 'fiscal_year']);
  });
});
