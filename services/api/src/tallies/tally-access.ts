import { ACTIONS_BY_STATE, can, type TallyAction, type TallyState } from '@tallyloom/core';
import type { Actor } from '../common/access/actor';

/** Which policy each action of the flow needs. */
const POLICY_OF = {
  edit: 'tallies.write',
  submit: 'tallies.write',
  amend: 'tallies.write',
  approve: 'tallies.review',
  return: 'tallies.review',
} as const satisfies Record<TallyAction, string>;

export const OWN_APPROVAL =
  'You cannot approve a tally you submitted; another reviewer must approve it.';

/**
 * What the person may do with a tally they can see (scope is already settled): the flow's
 * actions for its state, the role's policy for each, and never approving their own submission.
 */
export function allowedActions(
  actor: Actor,
  state: TallyState,
  submittedBy: number | null,
): TallyAction[] {
  return ACTIONS_BY_STATE[state].filter(
    (action) =>
      can(actor.role, POLICY_OF[action]) && !(action === 'approve' && submittedBy === actor.id),
  );
}
