import type { TallyValues } from '@tallyloom/core';
import { describe, expect, it } from 'vitest';
import { marchValues } from '@/testing/tally-fixtures';
import { compareRows } from './compare-rows';

const names = {
  blanketSizes: { 1: 'Baby', 3: 'Lap' },
  agencies: { 31: 'Maple Street Family Shelter', 33: 'Coastal County Neonatal Unit' },
};

function changed(rows: ReturnType<typeof compareRows>) {
  return rows.filter((row) => row.changed).map((row) => [row.field, row.left, row.right]);
}

describe('revisions side by side', () => {
  it('lists every figure of both revisions and marks only those that differ', () => {
    const approved = marchValues();
    const amended: TallyValues = {
      ...approved,
      panels: { ...approved.panels, usedInAssembly: 1_380, closing: 220 },
      notes: 'Counts corrected.',
    };

    const rows = compareRows(approved, amended, names);
    expect(changed(rows)).toEqual([
      ['panels.usedInAssembly', 1_400, 1_380],
      ['panels.closing', 200, 220],
      ['notes', null, 'Counts corrected.'],
    ]);
    // Unchanged figures are there too, with the same value on both sides.
    expect(rows.find((row) => row.field === 'panels.opening')).toMatchObject({
      label: 'Opening stock',
      left: 120,
      right: 120,
      changed: false,
    });
    expect(rows.find((row) => row.field === 'volunteerHours')).toMatchObject({
      left: 212.5,
      right: 212.5,
      changed: false,
    });
  });

  it('lines up a line by what it counts, not by its position in the list', () => {
    const approved = marchValues();
    const reordered: TallyValues = {
      ...approved,
      blankets: {
        ...approved.blankets,
        // Same lines, the other way round, one count changed.
        given: [
          { blanketSizeId: 3, partnerAgencyId: 31, count: 38 },
          { blanketSizeId: 1, partnerAgencyId: 33, count: 10 },
        ],
      },
    };

    const given = compareRows(approved, reordered, names).filter((row) =>
      row.field.startsWith('blankets.given.'),
    );
    expect(given.map((row) => [row.label, row.left, row.right, row.changed])).toEqual([
      ['Given out: Lap to Maple Street Family Shelter', 38, 38, false],
      ['Given out: Baby to Coastal County Neonatal Unit', 12, 10, true],
    ]);
  });

  it('keeps a line only one revision has, with a blank on the other side', () => {
    const approved = marchValues();
    const amended: TallyValues = {
      ...approved,
      peopleServed: [
        { partnerAgencyId: 31, group: 'children', count: 8 },
        { partnerAgencyId: 31, group: 'adults', count: 30 },
        { partnerAgencyId: 31, group: 'olderAdults', count: 4 },
      ],
    };

    const people = compareRows(approved, amended, names).filter(
      (row) => row.section === 'peopleServed',
    );
    expect(people.map((row) => [row.label, row.left, row.right, row.changed])).toEqual([
      // By agency, then group in the form's order; the removed line keeps its place.
      ['Coastal County Neonatal Unit: infants', 12, null, true],
      ['Maple Street Family Shelter: children', 8, 8, false],
      ['Maple Street Family Shelter: adults', 30, 30, false],
      ['Maple Street Family Shelter: older adults', null, 4, true],
    ]);
  });

  it('marks nothing when the figures are the same', () => {
    const rows = compareRows(marchValues(), marchValues(), names);
    expect(rows.length).toBeGreaterThan(15);
    expect(rows.some((row) => row.changed)).toBe(false);
  });
});
