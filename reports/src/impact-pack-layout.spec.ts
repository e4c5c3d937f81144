import { emptySnapshotFigures, PEOPLE_GROUPS } from '@tallyloom/core';
import {
  dataDictionary,
  headlineRows,
  impactPackSheets,
  MEASURE_UNITS,
} from './impact-pack-layout';
import { TALLY_MEASURES } from './tally-snapshot';

describe('impact pack layout', () => {
  it.each(['region', 'chapter'] as const)(
    'documents every column of every sheet (children: %s) exactly once',
    (child) => {
      const sheets = impactPackSheets(child);
      const dictionary = dataDictionary(sheets);
      const described = dictionary.map((row) => `${row.sheet} / ${row.column}`);
      const columns = sheets.flatMap((s) => s.columns.map((c) => `${s.name} / ${c.header}`));
      expect(described).toEqual(columns);
      expect(new Set(described).size).toBe(described.length);
      for (const row of dictionary) {
        expect([
          row.sheet,
          row.column,
          row.meaning.length > 10,
          row.unit !== '',
          row.source !== '',
        ]).toEqual([row.sheet, row.column, true, true, true]);
      }
    },
  );

  it('takes measure labels and descriptions from the tally snapshot definition', () => {
    const byScope = impactPackSheets('region')[2];
    const blankets = byScope.columns.find((column) => column.key === 'blanketsGiven');
    const definition = TALLY_MEASURES.find((measure) => measure.key === 'blanketsGiven')!;
    expect(blankets).toMatchObject({ header: definition.label, meaning: definition.description });
  });

  it('never sums a stock over time or scopes in a totals row', () => {
    const byMonth = impactPackSheets('region')[3];
    const totalled = byMonth.columns.filter((column) => column.total).map((column) => column.key);
    expect(totalled).not.toContain('panelsInStock');
    expect(totalled).not.toContain('blanketsInStock');
    expect(totalled).toContain('panelsAccepted');
  });

  it('lists the 13 measures in the headline, people by group spelled out', () => {
    const figures = { ...emptySnapshotFigures(), blanketsGiven: 7 };
    figures.peopleServedByGroup = { ...figures.peopleServedByGroup, olderAdults: 4 };
    const rows = headlineRows(figures);
    expect(rows).toHaveLength(TALLY_MEASURES.length - 1 + PEOPLE_GROUPS.length);
    expect(rows.find((row) => row.measure === 'Blankets given')).toMatchObject({
      figure: 7,
      unit: 'blankets',
    });
    expect(rows.find((row) => row.measure === 'People served by group: Older adults')?.figure).toBe(
      4,
    );
    expect(Object.keys(MEASURE_UNITS).sort()).toEqual(TALLY_MEASURES.map((m) => m.key).sort());
  });
});
