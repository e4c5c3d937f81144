import { DEFAULT_SETTINGS, settingsFromRows } from './settings.mappers';

describe('settingsFromRows', () => {
  it('gives the defaults when nothing is stored', () => {
    expect(settingsFromRows([])).toEqual({
      // common practice: a July–June fiscal year is a common US non-profit choice
      fiscalYearStartMonth: 7,
      // common practice: charity panel guidance commonly accepts about ±½ in
      panelToleranceIn: 0.5,
      receiptCountCeiling: 10_000,
      servedPerBlanketWarnFactor: 3,
      reminderDaysBeforeDue: 3,
      reminderDaysAfterDue: 2,
    });
  });

  it('lays stored values over the defaults, parsed or as JSON text', () => {
    expect(
      settingsFromRows([
        { key: 'fiscalYearStartMonth', value: 1 },
        { key: 'panelToleranceIn', value: '0.75' },
      ]),
    ).toEqual({
      fiscalYearStartMonth: 1,
      panelToleranceIn: 0.75,
      receiptCountCeiling: 10_000,
      servedPerBlanketWarnFactor: 3,
      reminderDaysBeforeDue: 3,
      reminderDaysAfterDue: 2,
    });
  });

  it('keeps the default for an unknown key or an unreadable value', () => {
    expect(
      settingsFromRows([
        { key: 'colourScheme', value: '"teal"' },
        { key: 'receiptCountCeiling', value: 'not json' },
        { key: 'fiscalYearStartMonth', value: '"7"' },
      ]),
    ).toEqual(DEFAULT_SETTINGS);
  });
});
