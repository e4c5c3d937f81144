/** Shapes for setting up the network: regions, chapters, partner agencies, campaigns, sizes, settings. */

export interface SaveRegionRequest {
  name: string;
  code: string;
}

export interface SaveChapterRequest {
  name: string;
  regionId: number;
  /** 1–28, so every month has the day. */
  reportingDueDay: number;
  /** ISO date. */
  activeFrom: string;
  activeTo?: string | null;
}

export const AGENCY_KINDS = [
  'family_shelter',
  'neonatal_or_childrens_ward',
  'care_home',
  'outreach',
  'disaster_relief',
  'other',
] as const;

export type AgencyKind = (typeof AGENCY_KINDS)[number];

export const AGENCY_KIND_LABELS: Record<AgencyKind, string> = {
  family_shelter: 'Family shelter',
  neonatal_or_childrens_ward: "Neonatal or children's ward",
  care_home: 'Care home',
  outreach: 'Outreach',
  disaster_relief: 'Disaster relief',
  other: 'Other',
};

export interface PartnerAgencyView {
  id: number;
  name: string;
  kind: AgencyKind;
  active: boolean;
  /** The chapters that serve the agency. */
  chapters: Array<{ id: number; name: string }>;
}

export interface SavePartnerAgencyRequest {
  name: string;
  kind: AgencyKind;
  chapterIds: number[];
  active?: boolean;
}

export interface CampaignView {
  id: number;
  /** Upper-case code written on parcel labels, e.g. "DWD26". */
  code: string;
  name: string;
  goalPanels: number;
  startsOn: string;
  endsOn: string;
  regionId: number | null;
  regionName: string | null;
}

export interface SaveCampaignRequest {
  code: string;
  name: string;
  goalPanels: number;
  startsOn: string;
  endsOn: string;
  regionId?: number | null;
}

export interface BlanketSizeView {
  id: number;
  name: string;
  columns: number;
  rows: number;
  /** columns × rows. */
  panels: number;
  widthIn: number;
  heightIn: number;
  widthCm: number;
  heightCm: number;
  active: boolean;
  sortOrder: number;
  sourceNote: string | null;
}

export interface SaveBlanketSizeRequest {
  name: string;
  columns: number;
  rows: number;
  active?: boolean;
  sortOrder?: number;
  sourceNote?: string | null;
}

/** Network-wide settings; each has a default and is changed by admins. */
export interface NetworkSettings {
  /** 1 = January … 12 = December. */
  fiscalYearStartMonth: number;
  /** Allowed difference of a measured panel from 7 × 9 in, in inches. */
  panelToleranceIn: number;
  /** A count above this on one receipt is refused as implausible. */
  receiptCountCeiling: number;
  /** A tally warns when people served exceed blankets given × this factor. */
  servedPerBlanketWarnFactor: number;
  /** Chapter leads whose tally is missing get a reminder this many days before the due day. */
  reminderDaysBeforeDue: number;
  /** … and another this many days after it. */
  reminderDaysAfterDue: number;
}

export interface VolunteerHourValueView {
  id: number;
  dataYear: number;
  /** Value of one volunteer hour in `currency`, e.g. 31.8. */
  hourlyValue: number;
  currency: string;
  /** The publication the figure comes from. */
  source: string;
}

export interface SaveVolunteerHourValueRequest {
  dataYear: number;
  hourlyValue: number;
  currency?: string;
  source: string;
}
