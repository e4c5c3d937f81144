import type { TallyCheckContext, TallyValues } from '../contract/tallies';
import { DomainError } from '../errors/domain-error';
import { emptyTallyValues } from './empty-values';
import { panelsInAssembledBlankets, stockFlowProblems } from './stock-flow';

// Catalogue entries of the demo kind: a 5 × 5 lap blanket and a 7 × 7 adult throw.
const SIZES: TallyCheckContext['blanketSizes'] = [
  { id: 1, name: 'Lap blanket', panels: 25 },
  { id: 2, name: 'Adult throw', panels: 49 },
];

function balanced(): TallyValues {
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
    assembled: [
      { blanketSizeId: 1, count: 2 },
      { blanketSizeId: 2, count: 1 },
    ],
    received: 1,
    given: [
      { blanketSizeId: 1, partnerAgencyId: 7, count: 2 },
      { blanketSizeId: 2, partnerAgencyId: 8, count: 1 },
    ],
    closing: 4,
  };
  return values;
}

describe('panelsInAssembledBlankets', () => {
  it('multiplies each line by the panels of its size', () => {
    // 2 × 25 + 1 × 49 = 99
    expect(panelsInAssembledBlankets(balanced().blankets.assembled, SIZES)).toBe(99);
    expect(panelsInAssembledBlankets([], SIZES)).toBe(0);
  });

  it('refuses a size that is not in the catalogue', () => {
    expect(() => panelsInAssembledBlankets([{ blanketSizeId: 9, count: 1 }], SIZES)).toThrow(
      DomainError,
    );
    expect(() => panelsInAssembledBlankets([{ blanketSizeId: 9, count: 1 }], SIZES)).toThrow(
      'assembled[0].blanketSizeId 9 is not in the catalogue.',
    );
  });
});

describe('stockFlowProblems', () => {
  it('finds nothing wrong in a balanced tally and shows the panels in progress', () => {
    const { problems, panelsInProgress } = stockFlowProblems(balanced(), { blanketSizes: SIZES });
    // 130 used − 99 in finished blankets = 31 in progress
    expect(panelsInProgress).toBe(31);
    expect(problems).toEqual([
      {
        code: 'panels-in-progress',
        severity: 'info',
        field: 'panels.usedInAssembly',
        message:
          '31 panels used in assembly are not in a finished blanket yet (blankets in progress).',
      },
    ]);
  });

  it('reports a panel closing stock that does not follow from the flow', () => {
    const values = balanced();
    values.panels.closing = 95;
    const { problems } = stockFlowProblems(values, { blanketSizes: SIZES });
    expect(problems.filter((p) => p.severity === 'error')).toEqual([
      {
        code: 'panel-flow',
        severity: 'error',
        field: 'panels.closing',
        message:
          'Panel closing stock should be 90 (opening 100 + accepted 120 − used 130); the tally says 95.',
      },
    ]);
  });

  it('reports a blanket closing stock that does not follow from the flow', () => {
    const values = balanced();
    values.blankets.given[0].count = 3;
    const { problems } = stockFlowProblems(values, { blanketSizes: SIZES });
    const flow = problems.find((p) => p.code === 'blanket-flow');
    expect(flow?.field).toBe('blankets.closing');
    expect(flow?.message).toBe(
      'Blanket closing stock should be 3 (opening 3 + assembled 3 + received 1 − given out 4); the tally says 4.',
    );
  });

  it('refuses blankets assembled from more panels than were used', () => {
    const values = balanced();
    values.panels.usedInAssembly = 90;
    values.panels.closing = 130;
    const { problems, panelsInProgress } = stockFlowProblems(values, { blanketSizes: SIZES });
    expect(panelsInProgress).toBe(0);
    expect(problems).toEqual([
      {
        code: 'assembled-exceeds-used',
        severity: 'error',
        field: 'panels.usedInAssembly',
        message:
          'The blankets assembled take 99 panels (2 × Lap blanket at 25, 1 × Adult throw at 49), but only 90 were used in assembly.',
      },
    ]);
  });

  it('is silent when every used panel is in a finished blanket', () => {
    const values = balanced();
    values.panels.usedInAssembly = 99;
    values.panels.closing = 121;
    expect(stockFlowProblems(values, { blanketSizes: SIZES })).toEqual({
      problems: [],
      panelsInProgress: 0,
    });
  });

  it('leaves out figures the value rules refuse instead of doing sums with them', () => {
    const values = balanced();
    values.panels.accepted = Number.NaN;
    values.blankets.assembled.push({ blanketSizeId: 9, count: 4 });
    values.blankets.closing = 4;
    const { problems } = stockFlowProblems(values, { blanketSizes: SIZES });
    expect(problems.map((p) => p.code)).toEqual(['blanket-flow', 'panels-in-progress']);
    expect(problems[1].message).toMatch(/^31 panels/);
  });
});
