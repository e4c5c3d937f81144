import type { TallyAction, TallyState } from '../contract/tallies';

// Draft → submitted → approved; submitted → returned → submitted; an approved tally changes only
// through an amendment, which opens a new draft revision.

export const ACTIONS_BY_STATE: Readonly<Record<TallyState, readonly TallyAction[]>> = {
  draft: ['edit', 'submit'],
  returned: ['edit', 'submit'],
  submitted: ['approve', 'return'],
  approved: ['amend'],
};

const NEXT_STATE: Readonly<Record<TallyAction, (state: TallyState) => TallyState>> = {
  edit: (state) => state,
  submit: () => 'submitted',
  approve: () => 'approved',
  return: () => 'returned',
  amend: () => 'draft',
};

const STATE_PHRASE: Readonly<Record<TallyState, string>> = {
  draft: 'a draft',
  submitted: 'submitted',
  returned: 'returned',
  approved: 'approved',
};

function isState(state: unknown): state is TallyState {
  return typeof state === 'string' && Object.prototype.hasOwnProperty.call(ACTIONS_BY_STATE, state);
}

function isAction(action: unknown): action is TallyAction {
  return typeof action === 'string' && Object.prototype.hasOwnProperty.call(NEXT_STATE, action);
}

/** The state after `action`, or null when the flow does not allow it from `state`. */
export function nextTallyState(state: TallyState, action: TallyAction): TallyState | null {
  if (!isState(state) || !isAction(action) || !ACTIONS_BY_STATE[state].includes(action)) {
    return null;
  }
  return NEXT_STATE[action](state);
}

/** Why `action` is not allowed from `state`, as a sentence for a person; null when it is. */
export function transitionRefusal(state: TallyState, action: TallyAction): string | null {
  if (!isState(state)) return `There is no tally state called ${JSON.stringify(state)}.`;
  if (!isAction(action)) return `There is no tally action called ${JSON.stringify(action)}.`;
  if (ACTIONS_BY_STATE[state].includes(action)) return null;
  const now = `this one is ${STATE_PHRASE[state]}.`;
  switch (action) {
    case 'edit':
      return state === 'approved'
        ? 'An approved tally is read-only; start an amendment to change it.'
        : 'A submitted tally cannot be edited while it waits for review; it can be edited again if it is returned.';
    case 'submit':
      return `Only a draft or returned tally can be submitted; ${now}`;
    case 'approve':
      return `Only a submitted tally can be approved; ${now}`;
    case 'return':
      return `Only a submitted tally can be returned; ${now}`;
    case 'amend':
      return `Only an approved tally can be amended; ${now}`;
  }
}
