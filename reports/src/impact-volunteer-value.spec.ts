import {
  hoursByDataYear,
  moneyText,
  volunteerValueRows,
  volunteerValueTotal,
  type HourValueSetting,
} from './impact-volunteer-value';

// Source: Independent Sector, Value of Volunteer Time, 2022 data: $31.80 an hour (named in issue #7).
const IS_2022: HourValueSetting = {
  dataYear: 2022,
  hourlyValue: 31.8,
  currency: 'USD',
  source: 'Independent Sector, Value of Volunteer Time (2022 data)',
};

describe('volunteer value', () => {
  it('adds hours by the calendar year of the month, oldest first', () => {
    expect(
      hoursByDataYear([
        { month: '2023-01', hours: 10.25 },
        { month: '2022-11', hours: 4 },
        { month: '2022-12', hours: 6.5 },
      ]),
    ).toEqual([
      { dataYear: 2022, hours: 10.5 },
      { dataYear: 2023, hours: 10.25 },
    ]);
  });

  it('values a year with a setting as hours × rate and prints the source with the rate', () => {
    const [row] = volunteerValueRows([{ dataYear: 2022, hours: 100 }], [IS_2022]);
    expect(row.estimatedValue).toBe(3180);
    expect(row.note).toBe(
      'Independent Sector, Value of Volunteer Time (2022 data): $31.80 per hour',
    );
  });

  it('shows a year without a value as such, never guessed, and leaves it out of the total', () => {
    const rows = volunteerValueRows(
      [
        { dataYear: 2022, hours: 10 },
        { dataYear: 2024, hours: 99 },
      ],
      [IS_2022],
    );
    expect(rows[1]).toMatchObject({
      value: null,
      estimatedValue: null,
      note: 'no value set for 2024',
    });
    expect(volunteerValueTotal(rows)).toEqual({ amount: 318, currency: 'USD' });
  });

  it('gives no total when no year has a value or the currencies differ', () => {
    expect(volunteerValueTotal(volunteerValueRows([{ dataYear: 2024, hours: 5 }], []))).toBeNull();
    const euro = { ...IS_2022, dataYear: 2023, currency: 'EUR' };
    const rows = volunteerValueRows(
      [
        { dataYear: 2022, hours: 1 },
        { dataYear: 2023, hours: 1 },
      ],
      [IS_2022, euro],
    );
    expect(volunteerValueTotal(rows)).toBeNull();
    expect(moneyText(31.8, 'EUR')).toBe('EUR 31.80');
  });

  it('rounds the value to cents', () => {
    // 33.3 hours × $31.80 = $1,058.94 exactly; binary floating point gives 1058.9399999…
    const [row] = volunteerValueRows([{ dataYear: 2022, hours: 33.3 }], [IS_2022]);
    expect(row.estimatedValue).toBe(1058.94);
  });
});
