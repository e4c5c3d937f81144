import type { TallyProblem, TallyProblemSeverity } from '../contract/tallies';

export function problem(
  severity: TallyProblemSeverity,
  code: string,
  field: string,
  message: string,
): TallyProblem {
  return { code, severity, field, message };
}
