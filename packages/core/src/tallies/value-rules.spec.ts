import type { TallyCheckContext, TallyValues } from '../contract/tallies';
import { emptyTallyValues } from './empty-values';
import { valueRuleProblems } from './value-rules';

const CONTEXT: Pick<TallyCheckContext, 'blanketSizes'> = {
  blanketSizes: [
    { id: 1, name: 'Lap blanket', panels: 25 },
    { id: 2, name: 'Adult throw', panels: 49 },
  ],
};

function valid(): TallyValues {
  const values = emptyTallyValues();
  values.panels.opening = 100;
  values.blankets.assembled = [{ blanketSizeId: 1, count: 2 }];
  values.blankets.given = [{ blanketSizeId: 1, partnerAgencyId: 7, count: 2 }];
  values.peopleServed = [{ partnerAgencyId: 7, group: 'children', count: 2 }];
  values.volunteerHours = 12.25;
  values.yarnDonated = { value: 1.5, unit: 'kg' };
  return values;
}

describe('valueRuleProblems', () => {
  it('accepts a tally with sensible figures', () => {
    expect(valueRuleProblems(valid(), CONTEXT)).toEqual([]);
    expect(valueRuleProblems(emptyTallyValues(), CONTEXT)).toEqual([]);
  });

  it('refuses negative, fractional and missing counts, naming the field', () => {
    const values = valid();
    values.panels.opening = -3;
    values.panels.setAside.offSize = 1.5;
    values.blankets.closing = undefined as unknown as number;
    values.blankets.given[0].count = -1;
    expect(valueRuleProblems(values, CONTEXT)).toEqual([
      {
        code: 'invalid-count',
        severity: 'error',
        field: 'panels.opening',
        message: 'Panel opening stock must be a whole number, 0 or more; got −3.',
      },
      {
        code: 'invalid-count',
        severity: 'error',
        field: 'panels.setAside.offSize',
        message: 'Set aside: Off-size must be a whole number, 0 or more; got 1.5.',
      },
      {
        code: 'invalid-count',
        severity: 'error',
        field: 'blankets.given[0].count',
        message: 'Given-out line 1 (Lap blanket): count must be a whole number, 0 or more; got −1.',
      },
      {
        code: 'invalid-count',
        severity: 'error',
        field: 'blankets.closing',
        message: 'Blanket closing stock must be a whole number, 0 or more; got undefined.',
      },
    ]);
  });

  it('refuses a count typed as text', () => {
    const values = valid();
    values.panels.accepted = '12' as unknown as number;
    expect(valueRuleProblems(values, CONTEXT)[0]).toMatchObject({
      field: 'panels.accepted',
      message: 'Panels accepted must be a whole number, 0 or more; got "12".',
    });
  });

  it('refuses blanket sizes that are not in the catalogue', () => {
    const values = valid();
    values.blankets.assembled.push({ blanketSizeId: 9, count: 1 });
    values.blankets.given.push({ blanketSizeId: 9, partnerAgencyId: 7, count: 1 });
    const problems = valueRuleProblems(values, CONTEXT);
    expect(problems.map((p) => [p.code, p.field])).toEqual([
      ['unknown-blanket-size', 'blankets.assembled[1].blanketSizeId'],
      ['unknown-blanket-size', 'blankets.given[1].blanketSizeId'],
    ]);
    expect(problems[0].message).toBe(
      'Assembled line 2 (blanket size #9): blanket size 9 is not in the catalogue.',
    );
  });

  it('refuses a line that repeats another', () => {
    const values = valid();
    values.blankets.assembled.push({ blanketSizeId: 2, count: 1 }, { blanketSizeId: 1, count: 3 });
    values.blankets.given.push({ blanketSizeId: 1, partnerAgencyId: 8, count: 1 });
    values.peopleServed.push(
      { partnerAgencyId: 7, group: 'adults', count: 1 },
      { partnerAgencyId: 7, group: 'children', count: 1 },
    );
    expect(valueRuleProblems(values, CONTEXT)).toEqual([
      {
        code: 'duplicate-line',
        severity: 'error',
        field: 'blankets.assembled[2]',
        message: 'Assembled line 3 (Lap blanket) repeats line 1; put both counts on one line.',
      },
      {
        code: 'duplicate-line',
        severity: 'error',
        field: 'peopleServed[2]',
        message: 'People-served line 3 repeats line 1; put both counts on one line.',
      },
    ]);
  });

  it('refuses an unknown group of people and a missing agency', () => {
    const values = valid();
    values.peopleServed[0].group = 'pets' as never;
    values.blankets.given[0].partnerAgencyId = 0;
    expect(valueRuleProblems(values, CONTEXT).map((p) => [p.code, p.field])).toEqual([
      ['invalid-agency', 'blankets.given[0].partnerAgencyId'],
      ['invalid-group', 'peopleServed[0].group'],
    ]);
  });

  it('takes volunteer hours with at most 2 decimals', () => {
    const hours = (volunteerHours: number) =>
      valueRuleProblems({ ...valid(), volunteerHours }, CONTEXT).map((p) => p.code);
    expect(hours(0)).toEqual([]);
    expect(hours(7.5)).toEqual([]);
    // 1.15 × 100 is 114.99999999999999 in binary floating point; it is still two decimals
    expect(hours(1.15)).toEqual([]);
    expect(hours(1234.56)).toEqual([]);
    expect(hours(1.125)).toEqual(['invalid-hours']);
    expect(hours(-0.5)).toEqual(['invalid-hours']);
    expect(hours(Number.POSITIVE_INFINITY)).toEqual(['invalid-hours']);
  });

  it('takes yarn as a weight above 0 in kg or lb, or nothing', () => {
    const yarn = (yarnDonated: TallyValues['yarnDonated']) =>
      valueRuleProblems({ ...valid(), yarnDonated }, CONTEXT).map((p) => p.field);
    expect(yarn(null)).toEqual([]);
    expect(yarn({ value: 3, unit: 'lb' })).toEqual([]);
    expect(yarn({ value: 0, unit: 'kg' })).toEqual(['yarnDonated.value']);
    expect(yarn({ value: 2, unit: 'oz' as never })).toEqual(['yarnDonated.unit']);
  });
});
