import type { TallyCheckResult, TallyProblem } from '../contract/tallies';
import { submissionProblems } from './submission';

const ERROR: TallyProblem = {
  code: 'panel-flow',
  severity: 'error',
  field: 'panels.closing',
  message: 'Panel closing stock should be 90.',
};
const HIGH: TallyProblem = {
  code: 'people-served-high',
  severity: 'warning',
  field: 'peopleServed',
  message: 'People served (31) is more than 3 × the blankets given out (10).',
};
const ODD: TallyProblem = {
  code: 'implausible.blanketsGiven',
  severity: 'warning',
  field: 'blankets.given',
  message: 'Blankets given out (212) is far from this chapter’s usual month.',
};

function result(errors: TallyProblem[], warnings: TallyProblem[]): TallyCheckResult {
  return { errors, warnings, infos: [], panelsInProgress: 0, plausibility: [] };
}

describe('submissionProblems', () => {
  it('lets a clean tally through', () => {
    expect(
      submissionProblems(result([], []), { acknowledgedWarnings: [], acknowledgementNote: null }),
    ).toEqual([]);
  });

  it('keeps every error, acknowledged or not', () => {
    expect(
      submissionProblems(result([ERROR], []), {
        acknowledgedWarnings: ['panel-flow'],
        acknowledgementNote: 'I know.',
      }),
    ).toEqual([ERROR]);
  });

  it('asks for each warning to be acknowledged and for a note', () => {
    expect(
      submissionProblems(result([], [HIGH, ODD]), {
        acknowledgedWarnings: ['people-served-high'],
        acknowledgementNote: '  ',
      }),
    ).toEqual([
      {
        code: 'unacknowledged.implausible.blanketsGiven',
        severity: 'error',
        field: 'blankets.given',
        message: `Acknowledge this warning before submitting: ${ODD.message}`,
      },
      {
        code: 'acknowledgement-note',
        severity: 'error',
        field: 'acknowledgementNote',
        message: 'Write a note saying why the warnings are acknowledged.',
      },
    ]);
  });

  it('lets warnings through once all are acknowledged with a note', () => {
    expect(
      submissionProblems(result([], [HIGH, ODD]), {
        acknowledgedWarnings: ['implausible.blanketsGiven', 'people-served-high', 'stale-code'],
        acknowledgementNote: 'Winter shelter opened; families of four each got one blanket.',
      }),
    ).toEqual([]);
  });
});
