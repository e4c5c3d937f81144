import {
  HEADLINE_COUNTS,
  HEADLINE_COUNT_LABELS,
  type HeadlineCount,
  type PlausibilityScore,
  type TallyCheckContext,
  type TallyProblem,
  type TallyValues,
} from '../contract/tallies';
import { formatNumber, isUsable, plural } from './format';
import { headlineCountsOf } from './headline';
import {
  CONSTANT_HISTORY_SLACK,
  MAX_HISTORY_MONTHS,
  MODIFIED_Z_THRESHOLD,
  scoreAgainstHistory,
} from './plausibility';
import { problem } from './problem';

/** The form field a headline count is entered in, for pointing a warning at it. */
export const HEADLINE_COUNT_FIELDS: Readonly<Record<HeadlineCount, string>> = {
  panelsAccepted: 'panels.accepted',
  panelsUsed: 'panels.usedInAssembly',
  blanketsAssembled: 'blankets.assembled',
  blanketsGiven: 'blankets.given',
  peopleServed: 'peopleServed',
  volunteerHours: 'volunteerHours',
};

function formatScore(score: number): string {
  const shown = formatNumber(Number(score.toFixed(1)));
  const limit = formatNumber(MODIFIED_Z_THRESHOLD);
  return score > 0 ? `${shown} > ${limit}` : `${shown} < −${limit}`;
}

function messageOf(score: PlausibilityScore, months: number): string {
  const label = HEADLINE_COUNT_LABELS[score.count];
  const window = `over the last ${plural(months, 'approved month', 'approved months')}`;
  const median = formatNumber(score.median ?? 0);
  switch (score.method) {
    case 'constant':
      return `${label} (${formatNumber(score.value)}) is far from this chapter's usual month (${median} in each of the last ${plural(months, 'approved month', 'approved months')}; it differs by more than ${formatNumber(CONSTANT_HISTORY_SLACK.units)} or ${formatNumber(CONSTANT_HISTORY_SLACK.share * 100)} % of that figure).`;
    case 'meanAbsoluteDeviation':
      return `${label} (${formatNumber(score.value)}) is far from this chapter's usual month (median ${median} ${window}; modified z-score ${formatScore(score.score ?? 0)}, from the mean absolute deviation since most months had the same figure).`;
    default:
      return `${label} (${formatNumber(score.value)}) is far from this chapter's usual month (median ${median} ${window}; modified z-score ${formatScore(score.score ?? 0)}).`;
  }
}

export interface PlausibilityCheck {
  scores: PlausibilityScore[];
  problems: TallyProblem[];
}

/** Scores every headline count against the chapter's own approved months; outliers warn. */
export function plausibilityProblems(
  values: TallyValues,
  context: Pick<TallyCheckContext, 'month' | 'history'>,
): PlausibilityCheck {
  const counts = headlineCountsOf(values);
  // This month never counts as its own history (an amendment's earlier revision may be listed).
  const history = context.history
    .filter((entry) => entry.month !== context.month)
    .sort((a, b) => (a.month < b.month ? -1 : a.month > b.month ? 1 : 0))
    .slice(-MAX_HISTORY_MONTHS);
  const scores: PlausibilityScore[] = [];
  const problems: TallyProblem[] = [];
  for (const count of HEADLINE_COUNTS) {
    const value = counts[count];
    if (!isUsable(value)) continue;
    const past = history.map((entry) => entry[count]).filter(isUsable);
    const score = scoreAgainstHistory(count, value, past);
    scores.push(score);
    if (score.flagged) {
      problems.push(
        problem(
          'warning',
          `implausible.${count}`,
          HEADLINE_COUNT_FIELDS[count],
          messageOf(score, past.length),
        ),
      );
    }
  }
  return { scores, problems };
}
