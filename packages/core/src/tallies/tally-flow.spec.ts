import {
  TALLY_ACTIONS,
  TALLY_STATES,
  type TallyAction,
  type TallyState,
} from '../contract/tallies';
import { ACTIONS_BY_STATE, nextTallyState, transitionRefusal } from './tally-flow';

describe('nextTallyState', () => {
  it('follows draft → submitted → approved', () => {
    expect(nextTallyState('draft', 'edit')).toBe('draft');
    expect(nextTallyState('draft', 'submit')).toBe('submitted');
    expect(nextTallyState('submitted', 'approve')).toBe('approved');
  });

  it('sends a returned tally back to submitted', () => {
    expect(nextTallyState('submitted', 'return')).toBe('returned');
    expect(nextTallyState('returned', 'edit')).toBe('returned');
    expect(nextTallyState('returned', 'submit')).toBe('submitted');
  });

  it('opens a draft when an approved tally is amended', () => {
    expect(nextTallyState('approved', 'amend')).toBe('draft');
  });

  it('allows nothing else', () => {
    const allowed = new Set([
      'draft:edit',
      'draft:submit',
      'returned:edit',
      'returned:submit',
      'submitted:approve',
      'submitted:return',
      'approved:amend',
    ]);
    for (const state of TALLY_STATES) {
      for (const action of TALLY_ACTIONS) {
        const next = nextTallyState(state, action);
        expect([`${state}:${action}`, next !== null]).toEqual([
          `${state}:${action}`,
          allowed.has(`${state}:${action}`),
        ]);
        expect(ACTIONS_BY_STATE[state].includes(action)).toBe(next !== null);
      }
    }
  });

  it('gives null for names it does not know', () => {
    expect(nextTallyState('archived' as TallyState, 'edit')).toBeNull();
    expect(nextTallyState('draft', 'delete' as TallyAction)).toBeNull();
  });
});

describe('transitionRefusal', () => {
  it('is null exactly when the flow allows the action', () => {
    for (const state of TALLY_STATES) {
      for (const action of TALLY_ACTIONS) {
        const refusal = transitionRefusal(state, action);
        expect(refusal === null).toBe(nextTallyState(state, action) !== null);
      }
    }
  });

  it('says why in a sentence', () => {
    expect(transitionRefusal('approved', 'approve')).toBe(
      'Only a submitted tally can be approved; this one is approved.',
    );
    expect(transitionRefusal('draft', 'approve')).toBe(
      'Only a submitted tally can be approved; this one is a draft.',
    );
    expect(transitionRefusal('approved', 'edit')).toBe(
      'An approved tally is read-only; start an amendment to change it.',
    );
    expect(transitionRefusal('returned', 'return')).toBe(
      'Only a submitted tally can be returned; this one is returned.',
    );
    expect(transitionRefusal('submitted', 'submit')).toBe(
      'Only a draft or returned tally can be submitted; this one is submitted.',
    );
    expect(transitionRefusal('submitted', 'amend')).toBe(
      'Only an approved tally can be amended; this one is submitted.',
    );
    expect(transitionRefusal('submitted', 'edit')).toMatch(/waits for review/);
    expect(transitionRefusal('draft', 'delete' as TallyAction)).toBe(
      'There is no tally action called "delete".',
    );
  });
});
