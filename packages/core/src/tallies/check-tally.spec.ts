import type { HeadlineCount, TallyCheckContext, TallyValues } from '../contract/tallies';
import { checkTally } from './check-tally';
import { emptyTallyValues } from './empty-values';
import { addMonths } from './months';

const SIZES: TallyCheckContext['blanketSizes'] = [
  { id: 1, name: 'Lap blanket', panels: 25 },
  { id: 2, name: 'Adult throw', panels: 49 },
];

// Twelve approved months of a steady chapter, Mar 2025 to Feb 2026.
const USUAL: Record<HeadlineCount, number[]> = {
  panelsAccepted: [118, 125, 120, 131, 110, 122, 119, 120, 127, 115, 121, 124],
  panelsUsed: [130, 128, 131, 125, 133, 129, 130, 127, 132, 130, 126, 131],
  blanketsAssembled: [3, 3, 4, 3, 2, 3, 3, 4, 3, 3, 2, 3],
  blanketsGiven: [36, 38, 40, 40, 41, 44, 39, 42, 40, 35, 45, 40],
  peopleServed: [40, 42, 45, 41, 44, 43, 40, 46, 42, 41, 44, 43],
  volunteerHours: [12, 14, 11.5, 13, 12.5, 12, 15, 11, 13.5, 12, 14, 12.5],
};

function history(months = 12): TallyCheckContext['history'] {
  return Array.from({ length: months }, (_, i) => ({
    month: addMonths('2025-03', i),
    panelsAccepted: USUAL.panelsAccepted[i],
    panelsUsed: USUAL.panelsUsed[i],
    blanketsAssembled: USUAL.blanketsAssembled[i],
    blanketsGiven: USUAL.blanketsGiven[i],
    peopleServed: USUAL.peopleServed[i],
    volunteerHours: USUAL.volunteerHours[i],
  }));
}

function context(overrides: Partial<TallyCheckContext> = {}): TallyCheckContext {
  return {
    month: '2026-03',
    receipts: {
      count: 4,
      panelsAccepted: 120,
      setAside: { offSize: 3, hardCareYarn: 1, soiledOrDamaged: 0, other: 0 },
      finishedBlankets: 1,
    },
    blanketSizes: SIZES,
    expectedOpening: { panels: 100, blankets: 40, fromMonth: '2026-02', approved: true },
    history: history(),
    servedPerBlanketWarnFactor: 3,
    ...overrides,
  };
}

/** A usual March: every flow balances and every figure is near the chapter's median. */
function usualMarch(): TallyValues {
  const values = emptyTallyValues();
  values.panels = {
    opening: 100,
    accepted: 120,
    setAside: { offSize: 3, hardCareYarn: 1, soiledOrDamaged: 0, other: 0 },
    usedInAssembly: 130,
    closing: 90,
  };
  values.blankets = {
    opening: 40,
    assembled: [
      { blanketSizeId: 1, count: 2 },
      { blanketSizeId: 2, count: 1 },
    ],
    received: 1,
    given: [
      { blanketSizeId: 1, partnerAgencyId: 7, count: 30 },
      { blanketSizeId: 2, partnerAgencyId: 8, count: 10 },
    ],
    closing: 4,
  };
  values.peopleServed = [
    { partnerAgencyId: 7, group: 'children', count: 30 },
    { partnerAgencyId: 8, group: 'olderAdults', count: 12 },
  ];
  values.volunteerHours = 12.5;
  return values;
}

describe('checkTally', () => {
  it('passes a usual month, showing only the panels in progress', () => {
    const result = checkTally(usualMarch(), context());
    expect(result.errors).toEqual([]);
    expect(result.warnings).toEqual([]);
    expect(result.infos.map((p) => p.code)).toEqual(['panels-in-progress']);
    // 130 used − (2 × 25 + 1 × 49) = 31
    expect(result.panelsInProgress).toBe(31);
    expect(result.plausibility.map((s) => [s.count, s.method, s.flagged])).toEqual([
      ['panelsAccepted', 'mad', false],
      ['panelsUsed', 'mad', false],
      ['blanketsAssembled', 'meanAbsoluteDeviation', false],
      ['blanketsGiven', 'mad', false],
      ['peopleServed', 'mad', false],
      ['volunteerHours', 'mad', false],
    ]);
  });

  it('warns in plain words about a figure far from the usual month', () => {
    const values = usualMarch();
    values.blankets.given[0].count = 202;
    values.blankets.closing = -168;
    values.peopleServed[0].count = 600;
    const result = checkTally(values, context());
    const warning = result.warnings.find((p) => p.code === 'implausible.blanketsGiven');
    // median 40, MAD 1.5 (see plausibility.spec); M(212) = 0.6745·172/1.5 = 77.3
    expect(warning).toEqual({
      code: 'implausible.blanketsGiven',
      severity: 'warning',
      field: 'blankets.given',
      message:
        "Blankets given out (212) is far from this chapter's usual month (median 40 over the last 12 approved months; modified z-score 77.3 > 3.5).",
    });
    // The flow balances, so the only error is the negative closing stock it leads to.
    expect(result.errors.map((p) => [p.code, p.field])).toEqual([
      ['invalid-count', 'blankets.closing'],
    ]);
    expect(result.warnings.map((p) => p.code)).toEqual([
      'implausible.blanketsGiven',
      'implausible.peopleServed',
    ]);
  });

  it('lists problems in the order of the form', () => {
    const values = usualMarch();
    values.panels.opening = 95;
    values.panels.closing = 80;
    values.panels.accepted = 125;
    values.blankets.given.push({ blanketSizeId: 1, partnerAgencyId: 7, count: 0 });
    const result = checkTally(values, context());
    expect(result.errors.map((p) => [p.field, p.code])).toEqual([
      ['panels.opening', 'opening-panels'],
      ['panels.closing', 'panel-flow'],
      ['receiptsDifferenceReason', 'receipts-difference'],
      ['blankets.given[2]', 'duplicate-line'],
    ]);
  });

  it('sorts warnings and keeps them apart from errors and infos', () => {
    const values = usualMarch();
    values.volunteerHours = 80;
    values.panels.accepted = 118;
    values.receiptsDifferenceReason = 'Two panels unravelled in the wash.';
    values.panels.closing = 88;
    const result = checkTally(
      values,
      context({
        expectedOpening: { panels: 100, blankets: 40, fromMonth: '2026-02', approved: false },
      }),
    );
    expect(result.errors).toEqual([]);
    expect(result.warnings.map((p) => p.code)).toEqual([
      'opening-not-approved',
      'implausible.volunteerHours',
    ]);
    expect(result.infos.map((p) => p.code)).toEqual([
      'receipts-difference-explained',
      'panels-in-progress',
    ]);
  });

  it('does not score a chapter with fewer than 6 approved months', () => {
    const values = usualMarch();
    values.blankets.given[0].count = 202;
    values.blankets.closing = -168;
    const result = checkTally(values, context({ history: history(5) }));
    expect(result.warnings).toEqual([]);
    expect(result.plausibility.every((s) => s.method === 'too-little-history')).toBe(true);
  });

  it('never counts the month itself as its own history', () => {
    const values = usualMarch();
    values.volunteerHours = 80;
    // An earlier revision of March listed in the history must not pull the median up.
    const withMarch = [...history(), { ...history()[0], month: '2026-03', volunteerHours: 80 }];
    const result = checkTally(values, context({ history: withMarch }));
    const hours = result.plausibility.find((s) => s.count === 'volunteerHours');
    expect(hours?.median).toBe(12.5);
    expect(hours?.flagged).toBe(true);
  });

  it('checks a half-typed tally without throwing', () => {
    const values = usualMarch();
    values.panels.usedInAssembly = Number.NaN;
    values.volunteerHours = Number.NaN;
    const result = checkTally(values, context());
    expect(result.errors.map((p) => p.field)).toEqual(['panels.usedInAssembly', 'volunteerHours']);
    expect(result.plausibility.map((s) => s.count)).not.toContain('volunteerHours');
  });
});
