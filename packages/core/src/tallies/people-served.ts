import type { TallyCheckContext, TallyProblem, TallyValues } from '../contract/tallies';
import { DomainError } from '../errors/domain-error';
import { formatNumber, isUsable, plural } from './format';
import { problem } from './problem';

/**
 * One blanket usually serves one person, a family a few; far more people than blankets × the
 * network's factor suggests a typing slip or people counted twice.
 */
export function peopleServedProblems(
  values: TallyValues,
  context: Pick<TallyCheckContext, 'servedPerBlanketWarnFactor'>,
): TallyProblem[] {
  const factor = context.servedPerBlanketWarnFactor;
  if (!isUsable(factor) || factor <= 0) {
    throw new DomainError(
      'servedPerBlanketWarnFactor',
      `servedPerBlanketWarnFactor must be greater than 0; got ${String(factor)}.`,
    );
  }
  const served = (Array.isArray(values.peopleServed) ? values.peopleServed : []).reduce(
    (total, line) => total + line.count,
    0,
  );
  const given = (Array.isArray(values.blankets.given) ? values.blankets.given : []).reduce(
    (total, line) => total + line.count,
    0,
  );
  if (!isUsable(served) || !isUsable(given) || served <= 0) return [];
  if (given <= 0) {
    return [
      problem(
        'warning',
        'people-served-without-blankets',
        'peopleServed',
        `${plural(served, 'person is', 'people are')} reported as served, but no blankets were given out this month.`,
      ),
    ];
  }
  if (served > given * factor) {
    return [
      problem(
        'warning',
        'people-served-high',
        'peopleServed',
        `People served (${formatNumber(served)}) is more than ${formatNumber(factor)} × the blankets given out (${formatNumber(given)}); check that no one is counted twice.`,
      ),
    ];
  }
  return [];
}
