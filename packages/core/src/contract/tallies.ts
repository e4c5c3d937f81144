/** Shapes of the monthly tally (BRIEF §3) shared by the API, the web app and the checks. */
import type { MassUnit } from '../units/mass';
import type { SetAsideReason } from './receipts';
import type { Page } from './users';

/** A calendar month as 'YYYY-MM'. */
export type MonthKey = string;

export const TALLY_STATES = ['draft', 'submitted', 'returned', 'approved'] as const;
export type TallyState = (typeof TALLY_STATES)[number];

export const TALLY_STATE_LABELS: Record<TallyState, string> = {
  draft: 'Draft',
  submitted: 'Submitted',
  returned: 'Returned',
  approved: 'Approved',
};

/** A revision's own state; an approved revision replaced by an approved amendment is superseded. */
export type TallyRevisionState = TallyState | 'superseded';

export const PEOPLE_GROUPS = [
  'infants',
  'children',
  'adults',
  'olderAdults',
  'disasterAffected',
] as const;
export type PeopleGroup = (typeof PEOPLE_GROUPS)[number];

export const PEOPLE_GROUP_LABELS: Record<PeopleGroup, string> = {
  infants: 'Infants',
  children: 'Children',
  adults: 'Adults',
  olderAdults: 'Older adults',
  disasterAffected: 'Disaster-affected',
};

export interface BlanketCountLine {
  blanketSizeId: number;
  count: number;
}

export interface BlanketsGivenLine {
  blanketSizeId: number;
  partnerAgencyId: number;
  count: number;
}

export interface PeopleServedLine {
  partnerAgencyId: number;
  group: PeopleGroup;
  count: number;
}

/** Every figure of one tally revision. Counts are whole numbers ≥ 0. */
export interface TallyValues {
  panels: {
    /** Last month's approved closing stock; entered by hand only in a chapter's first tally. */
    opening: number;
    /** Prefilled from the month's parcel receipts. */
    accepted: number;
    /** Prefilled from the month's parcel receipts; not part of the stock. */
    setAside: Record<SetAsideReason, number>;
    usedInAssembly: number;
    closing: number;
  };
  /** Why `panels.accepted` differs from the sum of the month's receipts; required when it does. */
  receiptsDifferenceReason: string | null;
  blankets: {
    opening: number;
    assembled: BlanketCountLine[];
    /** Finished blankets that arrived in parcels (prefilled from receipts). */
    received: number;
    given: BlanketsGivenLine[];
    closing: number;
  };
  peopleServed: PeopleServedLine[];
  /** Hours, at most 2 decimals. */
  volunteerHours: number;
  yarnDonated: { value: number; unit: MassUnit } | null;
  notes: string | null;
}

/** The counts compared with the chapter's own history (plausibility). */
export const HEADLINE_COUNTS = [
  'panelsAccepted',
  'panelsUsed',
  'blanketsAssembled',
  'blanketsGiven',
  'peopleServed',
  'volunteerHours',
] as const;
export type HeadlineCount = (typeof HEADLINE_COUNTS)[number];

export const HEADLINE_COUNT_LABELS: Record<HeadlineCount, string> = {
  panelsAccepted: 'Panels accepted',
  panelsUsed: 'Panels used in assembly',
  blanketsAssembled: 'Blankets assembled',
  blanketsGiven: 'Blankets given out',
  peopleServed: 'People served',
  volunteerHours: 'Volunteer hours',
};

/** Everything the checks need besides the values; the server builds it, the form reuses it. */
export interface TallyCheckContext {
  month: MonthKey;
  /** Sums of the chapter-month's parcel receipts. */
  receipts: {
    count: number;
    panelsAccepted: number;
    setAside: Record<SetAsideReason, number>;
    finishedBlankets: number;
  };
  /** The catalogue: panels each blanket size takes. */
  blanketSizes: Array<{ id: number; name: string; panels: number }>;
  /**
   * Opening stock that follows from last month's closing stock; null when the opening is
   * entered by hand (a chapter's first tally).
   */
  expectedOpening: {
    panels: number;
    blankets: number;
    fromMonth: MonthKey;
    approved: boolean;
  } | null;
  /** Headline counts of the chapter's last (up to) 12 approved months, oldest first. */
  history: Array<{ month: MonthKey } & Record<HeadlineCount, number>>;
  /** Warn when people served exceed blankets given × this factor (a network setting). */
  servedPerBlanketWarnFactor: number;
}

export type TallyProblemSeverity = 'error' | 'warning' | 'info';

export interface TallyProblem {
  /** Stable identifier, e.g. 'panel-flow' or 'implausible.blanketsGiven'; warnings are acknowledged by code. */
  code: string;
  severity: TallyProblemSeverity;
  /** Dotted path into TallyValues the problem is about, e.g. 'panels.closing'. */
  field: string;
  message: string;
}

/** One headline count scored against the chapter's history with the modified z-score. */
export interface PlausibilityScore {
  count: HeadlineCount;
  value: number;
  median: number | null;
  /** Median absolute deviation of the history. */
  mad: number | null;
  /** Modified z-score; null when there is too little history. */
  score: number | null;
  flagged: boolean;
  /**
   * 'mad': 0.6745·(x − median)/MAD. 'meanAbsoluteDeviation': MAD is 0, so
   * (x − median)/(1.253314·MeanAD). 'constant': every past month was the same figure.
   * 'too-little-history': fewer months than the minimum.
   */
  method: 'mad' | 'meanAbsoluteDeviation' | 'constant' | 'too-little-history';
}

export interface TallyCheckResult {
  errors: TallyProblem[];
  warnings: TallyProblem[];
  infos: TallyProblem[];
  /** Panels used beyond those in the blankets assembled: blankets in progress. */
  panelsInProgress: number;
  plausibility: PlausibilityScore[];
}

/** Reporting status of a chapter-month: computed from the due date, never stored. */
export type ReportingStatus = 'upcoming' | 'due' | 'on-time' | 'late' | 'missing';

export const REPORTING_STATUS_LABELS: Record<ReportingStatus, string> = {
  upcoming: 'Not due yet',
  due: 'Due',
  'on-time': 'On time',
  late: 'Late',
  missing: 'Missing',
};

export interface TallyHeadline {
  panelsAccepted: number;
  blanketsAssembled: number;
  blanketsGiven: number;
  peopleServed: number;
  volunteerHours: number;
}

export interface TallySummary {
  id: number;
  chapterId: number;
  chapterName: string;
  regionId: number;
  regionName: string;
  month: MonthKey;
  state: TallyState;
  /** The revision being worked on (the latest). */
  revision: number;
  /** The latest approved revision, which reports read; null until first approved. */
  approvedRevision: number | null;
  /** True while an amendment of an approved tally is not approved yet. */
  amendmentPending: boolean;
  /** ISO date. */
  dueOn: string;
  reporting: ReportingStatus;
  firstSubmittedAt: string | null;
  submittedAt: string | null;
  approvedAt: string | null;
  approvedByName: string | null;
  openingEnteredByHand: boolean;
  headline: TallyHeadline;
  /** Optimistic lock: every write sends the version it read. */
  version: number;
  updatedAt: string;
}

export interface TallyRevisionSummary {
  revision: number;
  state: TallyRevisionState;
  amendmentReason: string | null;
  createdAt: string;
  createdByName: string | null;
  submittedAt: string | null;
  submittedByName: string | null;
  approvedAt: string | null;
  approvedByName: string | null;
}

export interface TallyRevisionView extends TallyRevisionSummary {
  values: TallyValues;
  acknowledgedWarnings: string[];
  acknowledgementNote: string | null;
}

export type TallyEventKind =
  'created' | 'submitted' | 'returned' | 'approved' | 'amendment_started';

/** The review trail: each transition with who, when and the comment or reason given. */
export interface TallyEvent {
  kind: TallyEventKind;
  revision: number;
  at: string;
  byName: string | null;
  comment: string | null;
}

export const TALLY_ACTIONS = ['edit', 'submit', 'approve', 'return', 'amend'] as const;
export type TallyAction = (typeof TALLY_ACTIONS)[number];

export interface TallyDetail extends TallySummary {
  values: TallyValues;
  checkContext: TallyCheckContext;
  /** Checks as the server ran them on the stored values. */
  checks: TallyCheckResult;
  acknowledgedWarnings: string[];
  acknowledgementNote: string | null;
  amendmentReason: string | null;
  /** The latest return comment while the tally is returned. */
  returnComment: string | null;
  revisions: TallyRevisionSummary[];
  events: TallyEvent[];
  /** Partner agencies the chapter serves (for the given-out and people-served lines). */
  agencies: Array<{ id: number; name: string; kind: string }>;
  /** What the signed-in person may do now (the server enforces the same). */
  allowedActions: TallyAction[];
}

export interface CreateTallyRequest {
  chapterId: number;
  month: MonthKey;
  /** Only for a chapter's first tally, when there is no earlier closing stock to carry. */
  opening?: { panels: number; blankets: number } | null;
}

export interface SaveTallyRequest {
  version: number;
  values: TallyValues;
}

/** Sent with an `Idempotency-Key` header: the same key twice makes one submission. */
export interface SubmitTallyRequest {
  version: number;
  acknowledgedWarnings: string[];
  /** Required when there are warnings to acknowledge. */
  acknowledgementNote?: string | null;
}

export interface ApproveTallyRequest {
  version: number;
  comment?: string | null;
}

export interface ReturnTallyRequest {
  version: number;
  comment: string;
}

export interface AmendTallyRequest {
  version: number;
  reason: string;
}

/** Body of a 409 for a stale write: the tally as it is now, so the form can show what changed. */
export interface TallyConflictBody {
  statusCode: 409;
  error: 'Conflict';
  message: string;
  current: TallyDetail;
  requestId?: string;
}

export interface TallyListParams {
  page?: number;
  pageSize?: number;
  state?: TallyState;
  regionId?: number;
  chapterId?: number;
  /** 'YYYY-MM' */
  month?: MonthKey;
  from?: MonthKey;
  to?: MonthKey;
  sort?: 'month' | 'chapterName' | 'state' | 'submittedAt';
  direction?: 'asc' | 'desc';
}

export type TallyPage = Page<TallySummary>;

/** One chapter-month on a chapter lead's home: filed or not, and how it stands. */
export interface TallyCalendarEntry {
  chapterId: number;
  chapterName: string;
  month: MonthKey;
  dueOn: string;
  reporting: ReportingStatus;
  tallyId: number | null;
  state: TallyState | null;
  amendmentPending: boolean;
  returnComment: string | null;
}

export interface TallyCalendar {
  /** Newest month first. */
  entries: TallyCalendarEntry[];
  today: string;
}
