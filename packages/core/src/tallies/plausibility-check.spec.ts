import type { HeadlineCount, TallyCheckContext } from '../contract/tallies';
import { emptyTallyValues } from './empty-values';
import { addMonths } from './months';
import { HEADLINE_COUNT_FIELDS, plausibilityProblems } from './plausibility-check';

function historyOf(count: HeadlineCount, figures: number[]): TallyCheckContext['history'] {
  return figures.map((figure, i) => ({
    month: addMonths('2025-03', i),
    panelsAccepted: 0,
    panelsUsed: 0,
    blanketsAssembled: 0,
    blanketsGiven: 0,
    peopleServed: 0,
    volunteerHours: 0,
    [count]: figure,
  }));
}

function hours(volunteerHours: number) {
  return { ...emptyTallyValues(), volunteerHours };
}

describe('plausibilityProblems', () => {
  it('scores every headline count and warns only about the outliers', () => {
    const history = historyOf('volunteerHours', [12, 14, 11.5, 13, 12.5, 12, 15, 11]);
    const { scores, problems } = plausibilityProblems(hours(12), { month: '2026-03', history });
    expect(scores).toHaveLength(6);
    expect(problems).toEqual([]);
  });

  it('explains a month far below the usual one', () => {
    // sorted [11,11.5,12,12,12.5,13,14,15] → median 12.25; |x − 12.25| sorted
    // [0.25,0.25,0.25,0.75,0.75,1.25,1.75,2.75] → MAD 0.75; M(2) = 0.6745·(−10.25)/0.75 = −9.218
    const history = historyOf('volunteerHours', [12, 14, 11.5, 13, 12.5, 12, 15, 11]);
    const { problems } = plausibilityProblems(hours(2), { month: '2026-03', history });
    expect(problems).toEqual([
      {
        code: 'implausible.volunteerHours',
        severity: 'warning',
        field: 'volunteerHours',
        message:
          "Volunteer hours (2) is far from this chapter's usual month (median 12.25 over the last 8 approved months; modified z-score −9.2 < −3.5).",
      },
    ]);
  });

  it('says when the mean absolute deviation stood in for MAD', () => {
    // median 10, MAD 0, MeanAD 6/7 → M(20) = 9.3087 (see plausibility.spec)
    const history = historyOf('volunteerHours', [10, 10, 10, 10, 10, 12, 14]);
    const [problem] = plausibilityProblems(hours(20), { month: '2026-03', history }).problems;
    expect(problem.message).toBe(
      "Volunteer hours (20) is far from this chapter's usual month (median 10 over the last 7 approved months; modified z-score 9.3 > 3.5, from the mean absolute deviation since most months had the same figure).",
    );
  });

  it('says how a change from a constant history is judged', () => {
    const history = historyOf('volunteerHours', [5, 5, 5, 5, 5, 5]);
    const [problem] = plausibilityProblems(hours(8), { month: '2026-03', history }).problems;
    expect(problem.message).toBe(
      "Volunteer hours (8) is far from this chapter's usual month (5 in each of the last 6 approved months; it differs by more than 2 or 50 % of that figure).",
    );
  });

  it('points each count at its field on the form', () => {
    expect(HEADLINE_COUNT_FIELDS).toEqual({
      panelsAccepted: 'panels.accepted',
      panelsUsed: 'panels.usedInAssembly',
      blanketsAssembled: 'blankets.assembled',
      blanketsGiven: 'blankets.given',
      peopleServed: 'peopleServed',
      volunteerHours: 'volunteerHours',
    });
  });
});
