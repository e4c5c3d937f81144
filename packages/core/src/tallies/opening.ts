import type { TallyCheckContext, TallyProblem, TallyValues } from '../contract/tallies';
import { formatNumber, isUsable } from './format';
import { monthLabel } from './months';
import { problem } from './problem';

/** Each month's opening stock is last month's closing stock. */
export function openingProblems(
  values: TallyValues,
  context: Pick<TallyCheckContext, 'expectedOpening'>,
): TallyProblem[] {
  const expected = context.expectedOpening;
  if (expected === null) {
    return [
      problem(
        'info',
        'opening-by-hand',
        'panels.opening',
        'Opening stock is entered by hand: there is no earlier tally of this chapter to carry it from.',
      ),
    ];
  }
  const problems: TallyProblem[] = [];
  const from = monthLabel(expected.fromMonth);
  const compare = (field: string, what: string, actual: number, wanted: number) => {
    if (isUsable(actual) && actual !== wanted) {
      problems.push(
        problem(
          'error',
          field === 'panels.opening' ? 'opening-panels' : 'opening-blankets',
          field,
          `${what} opening stock (${formatNumber(actual)}) should equal the closing stock of ${from} (${formatNumber(wanted)}).`,
        ),
      );
    }
  };
  compare('panels.opening', 'Panel', values.panels.opening, expected.panels);
  compare('blankets.opening', 'Blanket', values.blankets.opening, expected.blankets);
  if (!expected.approved) {
    problems.push(
      problem(
        'warning',
        'opening-not-approved',
        'panels.opening',
        `Last month's tally is not approved yet: the opening stock comes from ${from}, whose closing stock may still change.`,
      ),
    );
  }
  return problems;
}
