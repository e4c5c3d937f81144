import { DEFAULT_PANEL_TOLERANCE_IN, type NetworkSettings } from '@tallyloom/core';
import type { VolunteerHourValueDto } from './dto/volunteer-hour-value.dto';
import type { VolunteerHourValue } from './models/volunteer-hour-value.model';

/** What the network uses until an admin changes it. */
export const DEFAULT_SETTINGS: Readonly<NetworkSettings> = {
  // common practice: a July–June fiscal year is a common US non-profit choice
  fiscalYearStartMonth: 7,
  panelToleranceIn: DEFAULT_PANEL_TOLERANCE_IN,
  receiptCountCeiling: 10_000,
  // Our own default, not a published figure: a blanket may serve a family, rarely more.
  servedPerBlanketWarnFactor: 3,
  // Our own defaults: early enough to act on, late enough not to nag.
  reminderDaysBeforeDue: 3,
  reminderDaysAfterDue: 2,
};

export const SETTING_KEYS = Object.keys(DEFAULT_SETTINGS) as Array<keyof NetworkSettings>;

/** A JSON column may come back parsed or as text, depending on the driver. */
function parsed(value: unknown): unknown {
  if (typeof value !== 'string') return value;
  try {
    return JSON.parse(value) as unknown;
  } catch {
    return undefined;
  }
}

/** The stored rows over the defaults; a missing or unreadable value keeps its default. */
export function settingsFromRows(
  rows: ReadonlyArray<{ key: string; value: unknown }>,
): NetworkSettings {
  const settings: NetworkSettings = { ...DEFAULT_SETTINGS };
  for (const row of rows) {
    if (!(SETTING_KEYS as string[]).includes(row.key)) continue;
    const value = parsed(row.value);
    if (typeof value === 'number' && Number.isFinite(value)) {
      settings[row.key as keyof NetworkSettings] = value;
    }
  }
  return settings;
}

export function toVolunteerHourValueDto(row: VolunteerHourValue): VolunteerHourValueDto {
  return {
    id: row.id,
    dataYear: row.dataYear,
    hourlyValue: Number(row.hourlyValue),
    currency: row.currency,
    source: row.source,
  };
}

export function auditableHourValue(row: VolunteerHourValue): Record<string, unknown> {
  return {
    dataYear: row.dataYear,
    hourlyValue: Number(row.hourlyValue),
    currency: row.currency,
    source: row.source,
  };
}
