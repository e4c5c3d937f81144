/**
 * Volunteer hours and their estimated value: hours per data year (the calendar year of the tally
 * month) times the hourly value set for that year, with the value's published source. A year
 * without a value is shown as such and left out of the total: a value is never guessed.
 */

export interface HourValueSetting {
  dataYear: number;
  hourlyValue: number;
  /** ISO 4217 code, e.g. 'USD'. */
  currency: string;
  source: string;
}

export interface VolunteerValueRow {
  dataYear: number;
  hours: number;
  /** The setting for the year; null when none is set. */
  value: HourValueSetting | null;
  /** hours × hourly value, rounded to cents; null without a value. */
  estimatedValue: number | null;
  /** e.g. 'Independent Sector, Value of Volunteer Time (2022 data): USD 31.80 per hour'. */
  note: string;
}

/** Hours summed per calendar year of the month ('YYYY-MM'), oldest year first. */
export function hoursByDataYear(
  months: ReadonlyArray<{ month: string; hours: number }>,
): Array<{ dataYear: number; hours: number }> {
  const years = new Map<number, number>();
  for (const { month, hours } of months) {
    const year = Number(month.slice(0, 4));
    if (!Number.isInteger(year)) throw new RangeError(`Not a month: ${JSON.stringify(month)}.`);
    years.set(year, (years.get(year) ?? 0) + hours);
  }
  return [...years.entries()]
    .sort(([a], [b]) => a - b)
    .map(([dataYear, hours]) => ({ dataYear, hours: roundTo(hours, 2) }));
}

export function roundTo(value: number, places: number): number {
  const factor = 10 ** places;
  return Math.round((value + Number.EPSILON) * factor) / factor;
}

/** Money in words for notes: '$31.80' for US dollars, else 'EUR 31.80'. */
export function moneyText(amount: number, currency: string): string {
  const fixed = amount.toFixed(2);
  return currency === 'USD' ? `$${fixed}` : `${currency} ${fixed}`;
}

export function volunteerValueRows(
  hours: ReadonlyArray<{ dataYear: number; hours: number }>,
  settings: readonly HourValueSetting[],
): VolunteerValueRow[] {
  const byYear = new Map(settings.map((setting) => [setting.dataYear, setting]));
  return hours.map(({ dataYear, hours: yearHours }) => {
    const value = byYear.get(dataYear) ?? null;
    return {
      dataYear,
      hours: yearHours,
      value,
      estimatedValue: value ? roundTo(yearHours * value.hourlyValue, 2) : null,
      note: value
        ? `${value.source}: ${moneyText(value.hourlyValue, value.currency)} per hour`
        : `no value set for ${dataYear}`,
    };
  });
}

/**
 * The total estimated value over the years that have one, when they share one currency; null
 * when no year has a value or currencies differ (a sum across currencies means nothing).
 */
export function volunteerValueTotal(
  rows: readonly VolunteerValueRow[],
): { amount: number; currency: string } | null {
  const valued = rows.filter((row) => row.value !== null);
  const currencies = new Set(valued.map((row) => row.value!.currency));
  if (valued.length === 0 || currencies.size !== 1) return null;
  return {
    amount: roundTo(
      valued.reduce((sum, row) => sum + (row.estimatedValue ?? 0), 0),
      2,
    ),
    currency: [...currencies][0],
  };
}
