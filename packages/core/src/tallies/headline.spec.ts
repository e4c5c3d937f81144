import { emptyTallyValues } from './empty-values';
import { headlineCountsOf, headlineOf } from './headline';

describe('emptyTallyValues', () => {
  it('starts every figure at 0 with no lines', () => {
    const values = emptyTallyValues();
    expect(values.panels).toEqual({
      opening: 0,
      accepted: 0,
      setAside: { offSize: 0, hardCareYarn: 0, soiledOrDamaged: 0, other: 0 },
      usedInAssembly: 0,
      closing: 0,
    });
    expect(values.blankets).toEqual({
      opening: 0,
      assembled: [],
      received: 0,
      given: [],
      closing: 0,
    });
    expect(values.peopleServed).toEqual([]);
    expect(values.yarnDonated).toBeNull();
  });

  it('gives a fresh object each time', () => {
    const first = emptyTallyValues();
    first.panels.setAside.offSize = 4;
    first.blankets.assembled.push({ blanketSizeId: 1, count: 1 });
    expect(emptyTallyValues().panels.setAside.offSize).toBe(0);
    expect(emptyTallyValues().blankets.assembled).toHaveLength(0);
  });
});

describe('headlineOf and headlineCountsOf', () => {
  it('sums the lines of each count', () => {
    const values = emptyTallyValues();
    values.panels.accepted = 312;
    values.panels.usedInAssembly = 260;
    values.blankets.assembled = [
      { blanketSizeId: 1, count: 4 },
      { blanketSizeId: 2, count: 3 },
    ];
    values.blankets.given = [
      { blanketSizeId: 1, partnerAgencyId: 7, count: 2 },
      { blanketSizeId: 2, partnerAgencyId: 8, count: 5 },
    ];
    values.peopleServed = [
      { partnerAgencyId: 7, group: 'infants', count: 2 },
      { partnerAgencyId: 8, group: 'olderAdults', count: 6 },
    ];
    values.volunteerHours = 41.5;
    expect(headlineOf(values)).toEqual({
      panelsAccepted: 312,
      blanketsAssembled: 7,
      blanketsGiven: 7,
      peopleServed: 8,
      volunteerHours: 41.5,
    });
    expect(headlineCountsOf(values)).toEqual({
      panelsAccepted: 312,
      panelsUsed: 260,
      blanketsAssembled: 7,
      blanketsGiven: 7,
      peopleServed: 8,
      volunteerHours: 41.5,
    });
  });
});
