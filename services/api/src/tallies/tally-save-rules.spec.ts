import { emptyTallyValues, type TallyValues } from '@tallyloom/core';
import { saveRuleProblems, type SaveRuleContext } from './tally-save-rules';

const context: SaveRuleContext = {
  knownSizeIds: new Set([1, 2]),
  agencyIds: new Set([7]),
  chapterName: 'Alder Falls',
  carriedOpenings: null,
};

function values(change: (v: TallyValues) => void = () => undefined): TallyValues {
  const v = emptyTallyValues();
  v.blankets.assembled = [{ blanketSizeId: 1, count: 2 }];
  v.blankets.given = [{ blanketSizeId: 1, partnerAgencyId: 7, count: 1 }];
  v.peopleServed = [{ partnerAgencyId: 7, group: 'infants', count: 1 }];
  change(v);
  return v;
}

describe('saveRuleProblems', () => {
  it('finds nothing wrong with lines that name known sizes and served agencies once each', () => {
    expect(saveRuleProblems(values(), context)).toEqual([]);
  });

  it('names an unknown size and an agency the chapter does not serve, by body path', () => {
    const found = saveRuleProblems(
      values((v) => {
        v.blankets.assembled[0].blanketSizeId = 9;
        v.peopleServed[0].partnerAgencyId = 8;
      }),
      context,
    );
    expect(found).toEqual([
      {
        field: 'values.blankets.assembled.0.blanketSizeId',
        messages: ['No blanket size 9 in the catalogue.'],
      },
      {
        field: 'values.peopleServed.0.partnerAgencyId',
        messages: ['Partner agency 8 is not one that Alder Falls serves.'],
      },
    ]);
  });

  it('names the second of two lines with the same key', () => {
    const found = saveRuleProblems(
      values((v) => {
        v.blankets.given.push({ blanketSizeId: 2, partnerAgencyId: 7, count: 1 });
        v.blankets.given.push({ blanketSizeId: 1, partnerAgencyId: 7, count: 4 });
      }),
      context,
    );
    expect(found.map((p) => p.field)).toEqual(['values.blankets.given.2']);
    expect(found[0].messages[0]).toContain('lines 1 and 3');
  });

  it('accepts an opening it holds or the one carried from last month, and names any other', () => {
    const carried = {
      ...context,
      carriedOpenings: [
        { panels: 10, blankets: 1 },
        { panels: 12, blankets: 1 },
      ],
    };
    const opening = (panels: number, blankets: number) =>
      values((v) => {
        v.panels.opening = panels;
        v.blankets.opening = blankets;
      });
    expect(saveRuleProblems(opening(12, 1), carried)).toEqual([]);
    expect(saveRuleProblems(opening(11, 2), carried).map((p) => p.field)).toEqual([
      'values.panels.opening',
      'values.blankets.opening',
    ]);
    // Typed in by hand (a chapter's first tally): any opening may be saved.
    expect(saveRuleProblems(opening(11, 2), context)).toEqual([]);
  });
});
