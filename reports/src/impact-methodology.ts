/**
 * The impact pack's methodology sheet: how tallies become figures, what counts, and the known gaps
 * of this one pack. One definition, read by the workbook (and later by the trace page).
 */
import type { ComplianceFigures, Period } from '@tallyloom/core';
import { TALLY_MEASURES } from './tally-snapshot';

const MONTH_NAMES = [
  'January',
  'February',
  'March',
  'April',
  'May',
  'June',
  'July',
  'August',
  'September',
  'October',
  'November',
  'December',
];

/** BRIEF §8: every export for funders says how the figures were made and as of when. */
export const FUNDERS_CAUTION =
  'Figures for funders are estimates built from volunteer reports: the Methodology sheet says how they were made, and "As of" says when.';

/** BRIEF §8: senders' details are personal data and never reach a grant writer's export. */
export const PERSONAL_DATA_NOTE =
  "No personal data of senders is included: figures are counts summed over tallies, never parcels' names, e-mails or addresses.";

export interface MethodologyInput {
  period: Period;
  fiscalYearStartMonth: number;
  /** The oldest "as of" of the snapshots the pack reads (ISO timestamp). */
  asOf: string;
  pendingTallies: number;
  compliance: ComplianceFigures;
  /** Chapters in scope, active in the period, with no approved tally in it. */
  chaptersWithoutApprovedTally: readonly string[];
  /** Data years whose volunteer hours have no hourly value set. */
  yearsWithoutHourValue: readonly number[];
}

export interface MethodologyRow {
  topic: string;
  text: string;
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

export function methodologyRows(input: MethodologyInput): MethodologyRow[] {
  const stock = TALLY_MEASURES.filter((m) => m.aggregation === 'closing').map((m) => m.label);
  const { compliance } = input;
  return [
    { topic: 'Estimates', text: FUNDERS_CAUTION },
    {
      topic: 'Where figures come from',
      text: 'Each chapter files one monthly tally: panels received and set aside, panels used, blankets made and given by size and partner agency, people served by group, volunteer hours and yarn donated. Background jobs add the tallies up into report snapshots for each chapter, region and the network, by month, quarter and fiscal year; this pack reads those snapshots.',
    },
    {
      topic: 'Approved tallies only',
      text: 'Only approved figures count: the approved revision of each monthly tally. A tally that is submitted, returned or still a draft adds nothing.',
    },
    {
      topic: 'Amendments',
      text: 'An approved tally is changed only by an amendment, a new revision with a reason. Its figures replace the approved ones when the amendment is approved; until then the approved figures stay in force.',
    },
    {
      topic: 'Stocks',
      text: `${stock.join(' and ')} are stocks, not flows: the closing stock of each chapter's last approved month in the period, added over chapters. They are not summed over months, so the By month sheet gives them no total.`,
    },
    {
      topic: 'Pending tallies',
      text: `Tallies filed but not approved yet (submitted, returned, or an amendment in progress) are shown beside the figures and never counted in them. This pack has ${plural(input.pendingTallies, 'pending tally', 'pending tallies')}.`,
    },
    {
      topic: 'Reporting compliance',
      text: `A chapter-month is on time when its tally was first submitted by the chapter's due day of the next month, late when after it, missing when the due day has passed with nothing filed, and open when it is not due yet. In this pack: ${compliance.expected} expected, ${compliance.onTime} on time, ${compliance.late} late, ${compliance.missing} missing, ${compliance.open} open.`,
    },
    {
      topic: 'Periods',
      text: `The fiscal year starts in ${MONTH_NAMES[input.fiscalYearStartMonth - 1]} (a network setting); FY2026 is the fiscal year that ends in 2026. Quarters are calendar quarters. A custom range adds up the snapshots of its months. This pack covers ${input.period.label} (${input.period.from} to ${input.period.to}).`,
    },
    {
      topic: 'Volunteer value',
      text: 'Volunteer hours are grouped by data year, the calendar year of the tally month, and multiplied by the value of an hour set for that year, with its published source beside it. A year with no value set is shown as such and left out of the total: no value is guessed.',
    },
    {
      topic: 'Known gaps: missing months',
      text:
        compliance.missing > 0
          ? `${plural(compliance.missing, 'chapter-month has', 'chapter-months have')} no tally although due: their figures are absent, not zero.`
          : 'No chapter-month in scope and period is missing its tally.',
    },
    {
      topic: 'Known gaps: chapters without figures',
      text:
        input.chaptersWithoutApprovedTally.length > 0
          ? `Chapters active in the period with no approved tally in it: ${input.chaptersWithoutApprovedTally.join(', ')}.`
          : 'Every chapter active in the period has at least one approved tally in it.',
    },
    {
      topic: 'Known gaps: hourly values',
      text:
        input.yearsWithoutHourValue.length > 0
          ? `No value of an hour is set for ${input.yearsWithoutHourValue.join(', ')}: those hours are not valued.`
          : 'Every data year of the period has a value of an hour set.',
    },
    {
      topic: 'Campaigns',
      text: 'Campaign progress counts panels from parcels that named the campaign, credited once the chapter-month is approved; it covers the whole run of each campaign, not only the period.',
    },
    {
      topic: 'Data as of',
      text: `The figures are those of the report snapshots as of ${input.asOf} (UTC), the oldest snapshot this pack reads. Approvals after that appear in the next pack.`,
    },
    { topic: 'Personal data', text: PERSONAL_DATA_NOTE },
  ];
}
