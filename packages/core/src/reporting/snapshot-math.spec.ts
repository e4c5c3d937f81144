import { SNAPSHOT_MEASURES, type SnapshotFigures } from '../contract/reports';
import { PEOPLE_GROUPS } from '../contract/tallies';
import {
  addFlowsInPlace,
  addSnapshotFigures,
  combineMonthsInto,
  emptySnapshotFigures,
} from './snapshot-math';

function figures(values: Partial<SnapshotFigures>): SnapshotFigures {
  return { ...emptySnapshotFigures(), approvedTallies: 1, ...values };
}

describe('emptySnapshotFigures', () => {
  it('has every measure and every people group at 0', () => {
    const empty = emptySnapshotFigures();
    expect(Object.keys(empty.peopleServedByGroup).sort()).toEqual([...PEOPLE_GROUPS].sort());
    expect(Object.values(empty.peopleServedByGroup).every((n) => n === 0)).toBe(true);
    const measures = Object.entries(empty).filter(([key]) => key !== 'peopleServedByGroup');
    expect(measures.map(([key]) => key).sort()).toEqual([...SNAPSHOT_MEASURES].sort());
    expect(measures.every(([, n]) => n === 0)).toBe(true);
  });

  it('gives a fresh object each time', () => {
    const a = emptySnapshotFigures();
    a.peopleServedByGroup[PEOPLE_GROUPS[0]] = 5;
    expect(emptySnapshotFigures().peopleServedByGroup[PEOPLE_GROUPS[0]]).toBe(0);
  });
});

const [infants, children] = PEOPLE_GROUPS;

describe('addSnapshotFigures (two chapters, one period)', () => {
  it('sums every measure, stock included', () => {
    const a = figures({
      panelsAccepted: 120,
      panelsSetAside: 4,
      panelsUsed: 96,
      blanketsAssembled: 3,
      blanketsReceived: 1,
      blanketsGiven: 2,
      peopleServed: 2,
      peopleServedByGroup: { ...emptySnapshotFigures().peopleServedByGroup, [infants]: 2 },
      volunteerHours: 10.1,
      yarnKg: 0.2,
      panelsInStock: 40,
      blanketsInStock: 5,
    });
    const b = figures({
      panelsAccepted: 80,
      panelsUsed: 48,
      blanketsAssembled: 1,
      blanketsGiven: 3,
      peopleServed: 3,
      peopleServedByGroup: {
        ...emptySnapshotFigures().peopleServedByGroup,
        [infants]: 1,
        [children]: 2,
      },
      volunteerHours: 20.2,
      yarnKg: 0.1,
      panelsInStock: 32,
      blanketsInStock: 1,
    });
    const sum = addSnapshotFigures(a, b);
    expect(sum).toMatchObject({
      panelsAccepted: 200,
      panelsSetAside: 4,
      panelsUsed: 144,
      blanketsAssembled: 4,
      blanketsReceived: 1,
      blanketsGiven: 5,
      peopleServed: 5,
      panelsInStock: 72,
      blanketsInStock: 6,
      approvedTallies: 2,
    });
    expect(sum.peopleServedByGroup[infants]).toBe(3);
    expect(sum.peopleServedByGroup[children]).toBe(2);
    // 10.1 + 20.2 is 30.299999999999997 in binary floating point
    expect(sum.volunteerHours).toBe(30.3);
    expect(sum.yarnKg).toBe(0.3);
  });

  it('leaves its inputs unchanged', () => {
    const a = figures({ panelsAccepted: 1 });
    addSnapshotFigures(a, figures({ panelsAccepted: 2 }));
    expect(a.panelsAccepted).toBe(1);
  });
});

describe('combineMonthsInto (one chapter, months into a longer period)', () => {
  const january = figures({
    panelsAccepted: 100,
    panelsUsed: 60,
    panelsInStock: 50,
    blanketsInStock: 4,
  });
  const february = figures({
    panelsAccepted: 90,
    panelsUsed: 120,
    panelsInStock: 20,
    blanketsInStock: 7,
  });
  const march = figures({
    panelsAccepted: 30,
    panelsUsed: 0,
    panelsInStock: 50,
    blanketsInStock: 2,
  });

  it('sums flows and keeps the last month’s stock', () => {
    const quarter = combineMonthsInto([january, february, march]);
    expect(quarter).toMatchObject({
      panelsAccepted: 220,
      panelsUsed: 180,
      panelsInStock: 50,
      blanketsInStock: 2,
      approvedTallies: 3,
    });
  });

  it('keeps the last approved month’s stock when the last month has no approved tally', () => {
    const quarter = combineMonthsInto([january, february, emptySnapshotFigures()]);
    expect(quarter.panelsInStock).toBe(20);
    expect(quarter.blanketsInStock).toBe(7);
    expect(quarter.approvedTallies).toBe(2);
  });

  it('gives empty figures for no months', () => {
    expect(combineMonthsInto([])).toEqual(emptySnapshotFigures());
  });

  it('differs from adding scopes only in the stock', () => {
    const added = [january, february].reduce(addSnapshotFigures, emptySnapshotFigures());
    const combined = combineMonthsInto([january, february]);
    expect({ ...combined, panelsInStock: 0, blanketsInStock: 0 }).toEqual({
      ...added,
      panelsInStock: 0,
      blanketsInStock: 0,
    });
    expect(added.panelsInStock).toBe(70);
    expect(combined.panelsInStock).toBe(20);
  });
});

describe('addFlowsInPlace', () => {
  it('adds every flow measure and every people group, and leaves stock alone', () => {
    // Each measure and group its own value, so a measure left out or added twice shows.
    const source = emptySnapshotFigures();
    SNAPSHOT_MEASURES.forEach((measure, index) => (source[measure] = index + 1));
    PEOPLE_GROUPS.forEach((group, index) => (source.peopleServedByGroup[group] = 100 + index));
    const target = emptySnapshotFigures();
    target.panelsInStock = 7;
    target.blanketsInStock = 8;
    addFlowsInPlace(target, source);
    addFlowsInPlace(target, source);
    const twice = addSnapshotFigures(source, source);
    for (const measure of SNAPSHOT_MEASURES) {
      if (measure === 'panelsInStock') expect(target[measure]).toBe(7);
      else if (measure === 'blanketsInStock') expect(target[measure]).toBe(8);
      else expect(`${measure} ${target[measure]}`).toBe(`${measure} ${twice[measure]}`);
    }
    expect(target.peopleServedByGroup).toEqual(twice.peopleServedByGroup);
  });

  it('keeps hours and kg to their stored precision', () => {
    const target = emptySnapshotFigures();
    const tenth = { ...emptySnapshotFigures(), volunteerHours: 0.1, yarnKg: 0.000001 };
    for (let i = 0; i < 3; i += 1) addFlowsInPlace(target, tenth);
    // 0.1 + 0.1 + 0.1 is 0.30000000000000004 in binary floating point.
    expect(target.volunteerHours).toBe(0.3);
    expect(target.yarnKg).toBe(0.000003);
  });
});
