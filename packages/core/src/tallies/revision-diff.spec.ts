import type { TallyValues } from '../contract/tallies';
import { emptyTallyValues } from './empty-values';
import { diffTallyValues } from './revision-diff';

const NAMES = {
  blanketSizes: { 1: 'Lap blanket', 2: 'Baby blanket' },
  agencies: { 7: 'Maple Street Family Shelter', 8: 'Riverside Care Home' },
};

function approved(): TallyValues {
  const values = emptyTallyValues();
  values.panels = {
    ...values.panels,
    opening: 100,
    accepted: 120,
    usedInAssembly: 130,
    closing: 90,
  };
  values.blankets = {
    opening: 3,
    assembled: [{ blanketSizeId: 1, count: 4 }],
    received: 0,
    given: [
      { blanketSizeId: 1, partnerAgencyId: 7, count: 2 },
      { blanketSizeId: 1, partnerAgencyId: 8, count: 1 },
    ],
    closing: 4,
  };
  values.peopleServed = [{ partnerAgencyId: 7, group: 'children', count: 2 }];
  values.volunteerHours = 12;
  values.notes = 'Quiet month.';
  return values;
}

describe('diffTallyValues', () => {
  it('finds no change between equal revisions', () => {
    expect(diffTallyValues(approved(), approved(), NAMES)).toEqual([]);
  });

  it('lists every changed figure with a label, in form order', () => {
    const amended = approved();
    amended.panels.usedInAssembly = 125;
    amended.panels.closing = 95;
    amended.panels.setAside.hardCareYarn = 2;
    amended.blankets.given = [
      { blanketSizeId: 1, partnerAgencyId: 8, count: 1 },
      { blanketSizeId: 1, partnerAgencyId: 7, count: 3 },
      { blanketSizeId: 2, partnerAgencyId: 7, count: 1 },
    ];
    amended.peopleServed = [{ partnerAgencyId: 8, group: 'olderAdults', count: 1 }];
    amended.yarnDonated = { value: 2.5, unit: 'kg' };
    amended.notes = '  Quiet month.  ';
    expect(diffTallyValues(approved(), amended, NAMES)).toEqual([
      {
        field: 'panels.setAside.hardCareYarn',
        label: 'Set aside: Hard-care yarn',
        before: 0,
        after: 2,
      },
      { field: 'panels.usedInAssembly', label: 'Panels used in assembly', before: 130, after: 125 },
      { field: 'panels.closing', label: 'Panel closing stock', before: 90, after: 95 },
      {
        field: 'blankets.given[1].count',
        label: 'Given out: Lap blanket → Maple Street Family Shelter',
        before: 2,
        after: 3,
      },
      {
        field: 'blankets.given[2].count',
        label: 'Given out: Baby blanket → Maple Street Family Shelter',
        before: null,
        after: 1,
      },
      {
        field: 'peopleServed[0].count',
        label: 'People served: Older adults at Riverside Care Home',
        before: null,
        after: 1,
      },
      {
        field: 'peopleServed[0].count',
        label: 'People served: Children at Maple Street Family Shelter',
        before: 2,
        after: null,
      },
      { field: 'yarnDonated', label: 'Yarn donated', before: null, after: '2.5 kg' },
    ]);
  });

  it('falls back to ids when names are not given', () => {
    const amended = approved();
    amended.blankets.assembled = [{ blanketSizeId: 1, count: 5 }];
    amended.notes = null;
    expect(diffTallyValues(approved(), amended)).toEqual([
      {
        field: 'blankets.assembled[0].count',
        label: 'Assembled: blanket size #1',
        before: 4,
        after: 5,
      },
      { field: 'notes', label: 'Notes', before: 'Quiet month.', after: null },
    ]);
  });
});
