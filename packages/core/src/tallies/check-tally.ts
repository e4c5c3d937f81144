import type {
  TallyCheckContext,
  TallyCheckResult,
  TallyProblem,
  TallyValues,
} from '../contract/tallies';
import { TALLY_FIELD_LABELS } from './labels';
import { openingProblems } from './opening';
import { peopleServedProblems } from './people-served';
import { plausibilityProblems } from './plausibility-check';
import { receiptsMatchProblems } from './receipts-match';
import { stockFlowProblems } from './stock-flow';
import { valueRuleProblems } from './value-rules';

// Problems are listed in the order of the form, so the check panel reads top to bottom with it.
const FIELD_ORDER = Object.keys(TALLY_FIELD_LABELS);

function positionOf(field: string): [number, number] {
  const index = FIELD_ORDER.findIndex(
    (known) => field === known || field.startsWith(`${known}.`) || field.startsWith(`${known}[`),
  );
  const line = /\[(\d+)\]/.exec(field);
  return [index === -1 ? FIELD_ORDER.length : index, line ? Number(line[1]) : -1];
}

function byFormOrder(a: TallyProblem, b: TallyProblem): number {
  const [fieldA, lineA] = positionOf(a.field);
  const [fieldB, lineB] = positionOf(b.field);
  return fieldA - fieldB || lineA - lineB || a.code.localeCompare(b.code);
}

/**
 * Every check of a tally: value rules, stock flow, receipts, opening stock, people served and
 * plausibility. The form runs it as you type and the server runs it on every save and submit.
 */
export function checkTally(values: TallyValues, context: TallyCheckContext): TallyCheckResult {
  const flow = stockFlowProblems(values, context);
  const plausibility = plausibilityProblems(values, context);
  const all = [
    ...valueRuleProblems(values, context),
    ...flow.problems,
    ...receiptsMatchProblems(values, context),
    ...openingProblems(values, context),
    ...peopleServedProblems(values, context),
    ...plausibility.problems,
  ].sort(byFormOrder);
  return {
    errors: all.filter((p) => p.severity === 'error'),
    warnings: all.filter((p) => p.severity === 'warning'),
    infos: all.filter((p) => p.severity === 'info'),
    panelsInProgress: flow.panelsInProgress,
    plausibility: plausibility.scores,
  };
}
