import { emptyTallyValues } from '@tallyloom/core';
import { figuresOf, normalizedValues } from './tally-values';

describe('tally values ↔ revision columns', () => {
  it('keeps the yarn weight in kilograms beside the unit it was weighed in', () => {
    const values = { ...emptyTallyValues(), yarnDonated: { value: 2, unit: 'lb' as const } };
    // Source: NIST SP 811 (2008), Appendix B: 1 lb = 0.45359237 kg exactly; 2 lb = 0.90718474 kg,
    // kept to the column's 6 decimals.
    expect(figuresOf(values)).toMatchObject({ yarnValue: 2, yarnUnit: 'lb', yarnKg: 0.907185 });
    expect(figuresOf(emptyTallyValues())).toMatchObject({ yarnValue: null, yarnKg: null });
  });

  it('puts lines in one order and absent text as null, so equal figures compare equal', () => {
    const values = emptyTallyValues();
    values.blankets.assembled = [
      { blanketSizeId: 3, count: 1 },
      { blanketSizeId: 1, count: 2 },
    ];
    values.peopleServed = [
      { partnerAgencyId: 4, group: 'adults', count: 1 },
      { partnerAgencyId: 4, group: 'infants', count: 2 },
      { partnerAgencyId: 2, group: 'olderAdults', count: 3 },
    ];
    const sent = { ...values, notes: undefined as unknown as null };
    const normal = normalizedValues(sent);
    expect(normal.blankets.assembled.map((line) => line.blanketSizeId)).toEqual([1, 3]);
    expect(normal.peopleServed.map((line) => `${line.partnerAgencyId}/${line.group}`)).toEqual([
      '2/olderAdults',
      '4/infants',
      '4/adults',
    ]);
    expect(normal.notes).toBeNull();
  });
});
