import type { CampaignProgressView } from '../contract/reports';
import { DomainError } from '../errors/domain-error';
import { requireWholeNumber } from '../errors/require';
import { addDays, daysBetween, requireIsoDate } from './days';
import { leastSquaresLine } from './least-squares';

/** How many of the latest complete weeks the trend line is fitted to. */
export const PROJECTION_WEEKS = 8;

export interface CampaignPaceInput {
  goalPanels: number;
  startsOn: string;
  /** Last day of the drive, included. */
  endsOn: string;
  /** ISO date; days before it count as elapsed, today itself does not. */
  today: string;
  /** Credited panels per campaign week (7-day blocks from startsOn), e.g. from bucketByWeek. */
  weekly: ReadonlyArray<{ weekStart: string; panels: number }>;
  creditedPanels: number;
  pendingPanels: number;
  asOf: string;
}

/** Everything of CampaignProgressView except the campaign's identity. */
export type CampaignPace = Omit<CampaignProgressView, 'campaignId' | 'code' | 'name'>;

interface Run {
  startsOn: string;
  daysTotal: number;
  daysElapsed: number;
}

/** The date on which `weeks` (fractional, counted from the start of startsOn) is reached. */
function dateAtWeeks(run: Run, weeks: number): string {
  // Week 1 ends at the end of day 7, i.e. on startsOn + 6. The small slack keeps 5 weeks, computed
  // as 4.999999…×7, on day 35 instead of 36.
  const day = Math.max(Math.ceil(weeks * 7 - 1e-9), 1);
  return addDays(run.startsOn, day - 1);
}

function weeklyWithCumulative(
  run: Run,
  weekly: CampaignPaceInput['weekly'],
): CampaignPace['weekly'] {
  const sorted = weekly
    .map((week, i) => {
      const offset = daysBetween(
        run.startsOn,
        requireIsoDate(`weekly[${i}].weekStart`, week.weekStart),
      );
      if (offset < 0 || offset % 7 !== 0) {
        throw new DomainError(
          `weekly[${i}].weekStart`,
          `weekly[${i}].weekStart must fall on startsOn or a multiple of 7 days after it; got ${week.weekStart}.`,
        );
      }
      requireWholeNumber(`weekly[${i}].panels`, week.panels);
      return { weekStart: week.weekStart, panels: week.panels };
    })
    .sort((a, b) => (a.weekStart < b.weekStart ? -1 : a.weekStart > b.weekStart ? 1 : 0));
  let cumulative = 0;
  return sorted.map((week) => ({ ...week, cumulative: (cumulative += week.panels) }));
}

/** Points (weeks since start at the week's end, cumulative panels) of the complete weeks. */
function completeWeekPoints(run: Run, weekly: CampaignPace['weekly']): Array<[number, number]> {
  const points: Array<[number, number]> = [];
  for (const week of weekly) {
    const endDay = Math.min(daysBetween(run.startsOn, week.weekStart) + 7, run.daysTotal);
    if (endDay <= run.daysElapsed) points.push([endDay / 7, week.cumulative]);
  }
  return points;
}

/** When the goal was actually reached, to the week: the end of that week, at most today. */
function goalReachedOn(
  run: Run,
  weekly: CampaignPace['weekly'],
  goalPanels: number,
  today: string,
): string {
  const week = weekly.find((w) => w.cumulative >= goalPanels);
  // The credited total may include receipts the weekly series does not (then: today).
  if (!week) return today;
  const weekEnd = addDays(week.weekStart, 6);
  const lastDay = addDays(run.startsOn, run.daysTotal - 1);
  return [weekEnd, lastDay, today].sort()[0];
}

/**
 * Campaign progress against the goal (BRIEF §4.5). Weeks are 7-day blocks from startsOn and may
 * be fractional: a 12-week drive 35 days in has 5 weeks elapsed and 7 left.
 * - pacePerWeek = credited ÷ weeks elapsed; 0 before any day has elapsed (on or before the start).
 * - neededPerWeek = (goal − credited) ÷ weeks left; 0 once the goal is met; null after the end date.
 * - projection: a least-squares line through the cumulative credited panels at the end of the
 *   last up to 8 complete weeks, extrapolated to the end date; with fewer than 2 complete weeks
 *   the current pace is continued instead; after the end, the final count. The projection is
 *   never below what is already credited (credits are not taken back). goalMetOn is when the
 *   line reaches the goal (never before today), null if not within the run; once the goal is
 *   met it is the end of the week in which that happened.
 */
export function campaignProgress(input: CampaignPaceInput): CampaignPace {
  const goalPanels = requireWholeNumber('goalPanels', input.goalPanels, 1);
  const creditedPanels = requireWholeNumber('creditedPanels', input.creditedPanels);
  const pendingPanels = requireWholeNumber('pendingPanels', input.pendingPanels);
  const startsOn = requireIsoDate('startsOn', input.startsOn);
  const endsOn = requireIsoDate('endsOn', input.endsOn);
  const today = requireIsoDate('today', input.today);
  if (endsOn < startsOn) {
    throw new DomainError(
      'endsOn',
      `endsOn (${endsOn}) must not be earlier than startsOn (${startsOn}).`,
    );
  }
  const daysTotal = daysBetween(startsOn, endsOn) + 1;
  const daysElapsed = Math.min(Math.max(daysBetween(startsOn, today), 0), daysTotal);
  const run: Run = { startsOn, daysTotal, daysElapsed };

  const weeksTotal = daysTotal / 7;
  const weeksElapsed = daysElapsed / 7;
  const weeksLeft = weeksTotal - weeksElapsed;
  const ended = today > endsOn;
  const goalMet = creditedPanels >= goalPanels;
  const pacePerWeek = weeksElapsed === 0 ? 0 : creditedPanels / weeksElapsed;
  const neededPerWeek = ended ? null : goalMet ? 0 : (goalPanels - creditedPanels) / weeksLeft;

  const weekly = weeklyWithCumulative(run, input.weekly);
  const projection = project(run, weekly, {
    goalPanels,
    creditedPanels,
    pacePerWeek,
    weeksElapsed,
    weeksTotal,
    ended,
    today,
  });
  if (goalMet) projection.goalMetOn = goalReachedOn(run, weekly, goalPanels, today);

  return {
    goalPanels,
    startsOn,
    endsOn,
    creditedPanels,
    pendingPanels,
    shareDone: creditedPanels / goalPanels,
    weeksElapsed,
    weeksTotal,
    weeksLeft,
    pacePerWeek,
    neededPerWeek,
    projection,
    weekly,
    asOf: input.asOf,
  };
}

function project(
  run: Run,
  weekly: CampaignPace['weekly'],
  facts: {
    goalPanels: number;
    creditedPanels: number;
    pacePerWeek: number;
    weeksElapsed: number;
    weeksTotal: number;
    ended: boolean;
    today: string;
  },
): CampaignPace['projection'] {
  const { goalPanels, creditedPanels, weeksTotal, today } = facts;
  if (facts.ended) {
    return {
      method: 'final count: the campaign has ended',
      panelsAtEnd: creditedPanels,
      goalMetOn: null,
    };
  }
  // Where the line (or pace) says the goal is reached, if within the run; never before today.
  const metOn = (weeksAtGoal: number | null): string | null => {
    if (weeksAtGoal === null || weeksAtGoal > weeksTotal) return null;
    const date = dateAtWeeks(run, weeksAtGoal);
    return date < today ? today : date;
  };

  const points = completeWeekPoints(run, weekly).slice(-PROJECTION_WEEKS);
  if (points.length >= 2) {
    const line = leastSquaresLine(points);
    return {
      method: `least-squares line over the last ${points.length} complete weeks of credited panels`,
      panelsAtEnd: Math.max(creditedPanels, Math.round(line.intercept + line.slope * weeksTotal)),
      goalMetOn: line.slope > 0 ? metOn((goalPanels - line.intercept) / line.slope) : null,
    };
  }
  const { pacePerWeek, weeksElapsed } = facts;
  return {
    method: 'pace so far continued to the end date (fewer than 2 complete weeks for a trend line)',
    panelsAtEnd: Math.round(creditedPanels + pacePerWeek * (weeksTotal - weeksElapsed)),
    goalMetOn:
      pacePerWeek > 0 ? metOn(weeksElapsed + (goalPanels - creditedPanels) / pacePerWeek) : null,
  };
}
