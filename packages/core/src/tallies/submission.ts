import type { TallyCheckResult, TallyProblem } from '../contract/tallies';
import { problem } from './problem';

export interface WarningAcknowledgement {
  acknowledgedWarnings: string[];
  acknowledgementNote: string | null;
}

/**
 * What stops a tally from being submitted: every error, every warning not acknowledged by its
 * code, and a missing note when there are warnings. Empty means it may be submitted.
 */
export function submissionProblems(
  result: TallyCheckResult,
  ack: WarningAcknowledgement,
): TallyProblem[] {
  const acknowledged = new Set(
    Array.isArray(ack.acknowledgedWarnings) ? ack.acknowledgedWarnings : [],
  );
  const problems: TallyProblem[] = [...result.errors];
  for (const warning of result.warnings) {
    if (!acknowledged.has(warning.code)) {
      problems.push(
        problem(
          'error',
          `unacknowledged.${warning.code}`,
          warning.field,
          `Acknowledge this warning before submitting: ${warning.message}`,
        ),
      );
    }
  }
  const note = typeof ack.acknowledgementNote === 'string' ? ack.acknowledgementNote.trim() : '';
  if (result.warnings.length > 0 && note === '') {
    problems.push(
      problem(
        'error',
        'acknowledgement-note',
        'acknowledgementNote',
        'Write a note saying why the warnings are acknowledged.',
      ),
    );
  }
  return problems;
}
