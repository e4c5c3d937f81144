import type { Role } from '@tallyloom/core';
import { allowedActions } from './tally-access';

const actor = (role: Role, id = 1) => ({
  id,
  email: 'a@test.example',
  role,
  regionId: 1,
  chapterId: 1,
});

describe('allowedActions', () => {
  it('lets a chapter lead edit and submit a draft or returned tally, and amend an approved one', () => {
    expect(allowedActions(actor('chapter_lead'), 'draft', null)).toEqual(['edit', 'submit']);
    expect(allowedActions(actor('chapter_lead'), 'returned', 1)).toEqual(['edit', 'submit']);
    expect(allowedActions(actor('chapter_lead'), 'submitted', 1)).toEqual([]);
    expect(allowedActions(actor('chapter_lead'), 'approved', 1)).toEqual(['amend']);
  });

  it('lets a coordinator approve or return a submitted tally, and nothing else', () => {
    expect(allowedActions(actor('regional_coordinator', 2), 'submitted', 1)).toEqual([
      'approve',
      'return',
    ]);
    expect(allowedActions(actor('regional_coordinator', 2), 'draft', null)).toEqual([]);
  });

  it('never offers approval to the person who submitted the revision', () => {
    expect(allowedActions(actor('national_staff', 5), 'submitted', 5)).toEqual(['return']);
    expect(allowedActions(actor('national_staff', 6), 'submitted', 5)).toEqual([
      'approve',
      'return',
    ]);
  });

  it('offers auditors nothing to do', () => {
    expect(allowedActions(actor('auditor'), 'submitted', 1)).toEqual([]);
  });
});
