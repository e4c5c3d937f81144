/**
 * The tally report snapshot, defined once: what it aggregates, from which tally fields, which
 * tally states count. The snapshot job, the API and the exports all read this file.
 */
import {
  PEOPLE_GROUPS,
  PERIOD_KINDS,
  SNAPSHOT_SCOPES,
  type PeopleGroup,
  type SnapshotFigures,
} from '@tallyloom/core';

/**
 * How a measure combines over months and chapters.
 * - `sum`: a flow, summed over the chapter-months of the period and scope.
 * - `closing`: a stock, the closing figure of each chapter's last approved month in the period,
 *   summed over chapters.
 * - `count`: the number of approved chapter-months.
 */
export type MeasureAggregation = 'sum' | 'closing' | 'count';

export interface SnapshotMeasure {
  key: keyof SnapshotFigures;
  label: string;
  /** Plain words for the exports' data dictionary. */
  description: string;
  /** The columns of the approved tally revision (or its line tables) the measure reads. */
  reads: string[];
  aggregation: MeasureAggregation;
  /** The fact column of `chapterMonthFactsSql` that carries the measure (one per group for a breakdown). */
  factColumns: string[];
}

const peopleColumn = (group: PeopleGroup): string =>
  `people_${group.replace(/[A-Z]/g, (letter) => `_${letter.toLowerCase()}`)}`;

/** The fact column of each people group, e.g. olderAdults → people_older_adults. */
export const PEOPLE_GROUP_COLUMNS: Record<PeopleGroup, string> = Object.fromEntries(
  PEOPLE_GROUPS.map((group) => [group, peopleColumn(group)]),
) as Record<PeopleGroup, string>;

export const TALLY_MEASURES: readonly SnapshotMeasure[] = [
  {
    key: 'panelsAccepted',
    label: 'Panels received',
    description: 'Panels accepted into stock from parcels during the period.',
    reads: ['tally_revisions.panels_accepted'],
    aggregation: 'sum',
    factColumns: ['panels_accepted'],
  },
  {
    key: 'panelsSetAside',
    label: 'Panels set aside',
    description:
      'Panels received but not used: off-size, hard-care yarn, soiled or damaged, and other reasons together.',
    reads: [
      'tally_revisions.set_aside_off_size',
      'tally_revisions.set_aside_hard_care',
      'tally_revisions.set_aside_soiled',
      'tally_revisions.set_aside_other',
    ],
    aggregation: 'sum',
    factColumns: ['panels_set_aside'],
  },
  {
    key: 'panelsUsed',
    label: 'Panels used in assembly',
    description: 'Panels sewn into blankets during the period.',
    reads: ['tally_revisions.panels_used'],
    aggregation: 'sum',
    factColumns: ['panels_used'],
  },
  {
    key: 'blanketsAssembled',
    label: 'Blankets made',
    description: 'Blankets of every size assembled by the chapters during the period.',
    reads: ['tally_blankets_assembled.count'],
    aggregation: 'sum',
    factColumns: ['blankets_assembled'],
  },
  {
    key: 'blanketsReceived',
    label: 'Finished blankets received',
    description: 'Finished blankets that arrived in parcels during the period.',
    reads: ['tally_revisions.blankets_received'],
    aggregation: 'sum',
    factColumns: ['blankets_received'],
  },
  {
    key: 'blanketsGiven',
    label: 'Blankets given',
    description: 'Blankets of every size handed to partner agencies during the period.',
    reads: ['tally_blankets_given.count'],
    aggregation: 'sum',
    factColumns: ['blankets_given'],
  },
  {
    key: 'peopleServed',
    label: 'People served',
    description:
      'People the partner agencies served with the blankets, as the chapters reported them (all groups).',
    reads: ['tally_people_served.count'],
    aggregation: 'sum',
    factColumns: ['people_served'],
  },
  {
    key: 'peopleServedByGroup',
    label: 'People served by group',
    description:
      'People served, split into infants, children, adults, older adults and disaster-affected.',
    reads: ['tally_people_served.people_group', 'tally_people_served.count'],
    aggregation: 'sum',
    factColumns: PEOPLE_GROUPS.map((group) => PEOPLE_GROUP_COLUMNS[group]),
  },
  {
    key: 'volunteerHours',
    label: 'Volunteer hours',
    description: 'Hours volunteers gave to the chapters during the period.',
    reads: ['tally_revisions.volunteer_hours'],
    aggregation: 'sum',
    factColumns: ['volunteer_hours'],
  },
  {
    key: 'yarnKg',
    label: 'Yarn donated (kg)',
    description: 'Weight of yarn donated during the period, in kilograms (pounds converted).',
    reads: ['tally_revisions.yarn_kg'],
    aggregation: 'sum',
    factColumns: ['yarn_kg'],
  },
  {
    key: 'panelsInStock',
    label: 'Panels in stock',
    description:
      "Panels waiting to be assembled at the end of the period: each chapter's closing stock in its last approved month of the period.",
    reads: ['tally_revisions.panels_closing'],
    aggregation: 'closing',
    factColumns: ['panels_closing'],
  },
  {
    key: 'blanketsInStock',
    label: 'Blankets in stock',
    description:
      "Finished blankets not yet given out at the end of the period: each chapter's closing stock in its last approved month of the period.",
    reads: ['tally_revisions.blankets_closing'],
    aggregation: 'closing',
    factColumns: ['blankets_closing'],
  },
  {
    key: 'approvedTallies',
    label: 'Approved tallies',
    description: 'Monthly tallies (chapter-months) whose approved figures are counted.',
    reads: ['monthly_tallies.approved_revision'],
    aggregation: 'count',
    factColumns: ['tally_id'],
  },
];

/**
 * The tally report snapshot. Only approved figures count: the revision named by
 * `monthly_tallies.approved_revision`. While an amendment is in progress that revision stays in
 * force, so a report never shows figures nobody has approved.
 */
export const TALLY_SNAPSHOT = {
  name: 'tally',
  dimensions: {
    /** Smallest first: chapter rolls up to its region, regions to the network. */
    scope: SNAPSHOT_SCOPES,
    /** Smallest first: month → calendar quarter → fiscal year (start month is a setting). */
    period: PERIOD_KINDS,
  },
  measures: TALLY_MEASURES,
  counts: 'the approved revision of each monthly tally (monthly_tallies.approved_revision)',
  /*
   * Pending: tallies in scope and period that were filed but whose figures are not approved yet,
   * shown beside the figures and never in them. That is a tally in state submitted or returned,
   * or an approved tally with an amendment in progress (current_revision past approved_revision).
   * Drafts never filed are not pending: compliance counts them as missing.
   */
  pending: "state IN ('submitted', 'returned') OR current_revision > approved_revision",
} as const;

/** SQL condition of a pending tally on `monthly_tallies` aliased `t` (see TALLY_SNAPSHOT.pending). */
export const PENDING_TALLY_CONDITION =
  "(t.state IN ('submitted', 'returned') OR (t.approved_revision IS NOT NULL AND t.current_revision > t.approved_revision))";
