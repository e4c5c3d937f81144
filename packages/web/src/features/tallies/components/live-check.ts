import {
  checkTally,
  type TallyCheckContext,
  type TallyCheckResult,
  type TallyProblem,
} from '@tallyloom/core';
import type { ReadForm } from './tally-form-model';

// Core's value rules, which the form's own reading of each box already reports in its words.
const SAID_BY_THE_FORM = new Set(['invalid-count', 'invalid-hours', 'invalid-yarn']);

/**
 * The checks for what is typed now: the boxes that are not figures (as the form words them),
 * then every check of core's `checkTally`, the same code the server runs.
 */
export function liveCheck(read: ReadForm, context: TallyCheckContext): TallyCheckResult {
  const result = checkTally(read.values, context);
  const typed: TallyProblem[] = read.invalid.map(({ name, message }) => ({
    code: `typed:${name}`,
    severity: 'error',
    field: name,
    message,
  }));
  return {
    ...result,
    errors: [...typed, ...result.errors.filter((problem) => !SAID_BY_THE_FORM.has(problem.code))],
  };
}
