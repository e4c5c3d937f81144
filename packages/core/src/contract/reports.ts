/** Report snapshots, dashboards and campaign progress (BRIEF §3, §4.5–4.6). */
import type { PeopleGroup } from './tallies';

export const SNAPSHOT_SCOPES = ['chapter', 'region', 'network'] as const;
export type SnapshotScope = (typeof SNAPSHOT_SCOPES)[number];

export const PERIOD_KINDS = ['month', 'quarter', 'fiscal_year'] as const;
export type PeriodKind = (typeof PERIOD_KINDS)[number];

/**
 * A reporting period. Keys: month 'YYYY-MM'; quarter 'YYYY-Qn' (calendar quarters);
 * fiscal year 'FY2026' = the fiscal year that ENDS in 2026 (start month from settings);
 * custom 'YYYY-MM..YYYY-MM'.
 */
export interface Period {
  /** 'custom' only for a dashboard range: snapshots are stored for the three fixed kinds. */
  kind: PeriodKind | 'custom';
  key: string;
  /** First month, 'YYYY-MM'. */
  from: string;
  /** Last month, 'YYYY-MM' (inclusive). */
  to: string;
  /** e.g. "Mar 2026", "Q1 2026", "FY 2025–26". */
  label: string;
}

/** The figures of one snapshot: sums over the approved tally revisions in scope and period. */
export interface SnapshotFigures {
  panelsAccepted: number;
  panelsSetAside: number;
  panelsUsed: number;
  blanketsAssembled: number;
  blanketsReceived: number;
  blanketsGiven: number;
  peopleServed: number;
  peopleServedByGroup: Record<PeopleGroup, number>;
  volunteerHours: number;
  yarnKg: number;
  /** Stock at the end of the period: closing stock of each chapter's last approved month in it. */
  panelsInStock: number;
  blanketsInStock: number;
  /** Approved tallies the figures are built from. */
  approvedTallies: number;
}

/** Every single-number measure of SnapshotFigures (people by group is a breakdown of one). */
export const SNAPSHOT_MEASURES = [
  'panelsAccepted',
  'panelsSetAside',
  'panelsUsed',
  'blanketsAssembled',
  'blanketsReceived',
  'blanketsGiven',
  'peopleServed',
  'volunteerHours',
  'yarnKg',
  'panelsInStock',
  'blanketsInStock',
  'approvedTallies',
] as const satisfies ReadonlyArray<keyof SnapshotFigures>;

/** Reporting compliance of the chapter-months in scope and period. */
export interface ComplianceFigures {
  expected: number;
  onTime: number;
  late: number;
  missing: number;
  /** Not due yet or due but not past the due day. */
  open: number;
}

export interface SnapshotView {
  scope: SnapshotScope;
  /** Null for the network. */
  scopeId: number | null;
  scopeName: string;
  period: Period;
  figures: SnapshotFigures;
  compliance: ComplianceFigures;
  /** Tallies in scope and period filed but not approved yet: not in the figures. */
  pendingTallies: number;
  /** When the snapshot was built (ISO timestamp). */
  asOf: string;
}

export interface DashboardParams {
  periodKind: PeriodKind | 'custom';
  /** Period key for month/quarter/fiscal_year; ignored for custom. */
  period?: string;
  /** 'YYYY-MM' for custom ranges. */
  from?: string;
  to?: string;
}

export interface DashboardView {
  scope: SnapshotScope;
  scopeId: number | null;
  scopeName: string;
  period: Period;
  current: SnapshotView;
  /** The period before, same length, for "change vs previous period". */
  previous: SnapshotView | null;
  /** One snapshot per month of the period (or of the last 12 months for a single month). */
  trend: SnapshotView[];
  /** One snapshot per child scope: regions of the network, chapters of a region; empty for a chapter. */
  breakdown: SnapshotView[];
  /** The oldest asOf among the snapshots shown. */
  asOf: string;
}

export interface CampaignProgressView {
  campaignId: number;
  code: string;
  name: string;
  goalPanels: number;
  startsOn: string;
  endsOn: string;
  /** Panels credited by parcel receipts in approved tally months. */
  creditedPanels: number;
  /** Panels credited by receipts whose month is not approved yet: shown beside, not counted. */
  pendingPanels: number;
  /** credited / goal, 0–1 (may exceed 1). */
  shareDone: number;
  weeksElapsed: number;
  weeksTotal: number;
  weeksLeft: number;
  pacePerWeek: number;
  /** Panels per week still needed to meet the goal by the end date; null once the end has passed. */
  neededPerWeek: number | null;
  projection: {
    /** Plain words, e.g. "least-squares line over the last 8 weeks of credited panels". */
    method: string;
    /** Projected credited panels at the end date. */
    panelsAtEnd: number;
    /** ISO date the goal is projected to be met, or null if not within the run. */
    goalMetOn: string | null;
  };
  /** Credited panels per week since the start (for the chart). */
  weekly: Array<{ weekStart: string; panels: number; cumulative: number }>;
  asOf: string;
}

/** What the public, read-only progress page shows: counts only, nothing about people. */
export type PublicCampaignProgress = Pick<
  CampaignProgressView,
  | 'code'
  | 'name'
  | 'goalPanels'
  | 'startsOn'
  | 'endsOn'
  | 'creditedPanels'
  | 'shareDone'
  | 'weeksLeft'
  | 'pacePerWeek'
  | 'neededPerWeek'
  | 'weekly'
  | 'asOf'
>;

export interface JobQueueView {
  name: string;
  counts: {
    waiting: number;
    active: number;
    completed: number;
    failed: number;
    delayed: number;
  };
  active: Array<{ id: string; name: string; progress: number; startedAt: string | null }>;
  failed: Array<{
    id: string;
    name: string;
    failedReason: string;
    attemptsMade: number;
    failedAt: string | null;
  }>;
  repeatable: Array<{ name: string; cron: string | null; next: string | null }>;
}
