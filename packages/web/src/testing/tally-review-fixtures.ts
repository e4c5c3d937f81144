import type {
  TallyDetail,
  TallyPage,
  TallyRevisionView,
  TallySummary,
  TallyValues,
} from '@tallyloom/core';
import { draftTally } from './tally-fixtures';

// The review side of the demo tallies: the chapter lead's March 2026 tally (tally-fixtures.ts)
// as a reviewer meets it, submitted, amended, and in the queue with others.

/** Submitted with one warning the lead acknowledged, and Approve and Return open to the reader. */
export function submittedTally(overrides: Partial<TallyDetail> = {}): TallyDetail {
  const draft = draftTally();
  return draftTally({
    state: 'submitted',
    reporting: 'on-time',
    firstSubmittedAt: '2026-04-06T09:30:00Z',
    submittedAt: '2026-04-06T09:30:00Z',
    version: 7,
    checks: {
      errors: [],
      warnings: [
        {
          code: 'implausible.panelsAccepted',
          severity: 'warning',
          field: 'panels.accepted',
          message: 'Panels accepted (1,480) is far above the chapter’s usual month.',
        },
      ],
      infos: [],
      panelsInProgress: 8,
      plausibility: [
        {
          count: 'panelsAccepted',
          value: 1_480,
          median: 1_475,
          mad: 30,
          score: 0.11,
          flagged: false,
          method: 'mad',
        },
        {
          count: 'blanketsGiven',
          value: 50,
          median: 50,
          mad: 0,
          score: null,
          flagged: false,
          method: 'constant',
        },
      ],
    },
    acknowledgedWarnings: ['implausible.panelsAccepted'],
    acknowledgementNote: 'A school drive brought in extra panels this month.',
    revisions: draft.revisions.map((revision) => ({
      ...revision,
      state: 'submitted',
      submittedAt: '2026-04-06T09:30:00Z',
      submittedByName: 'Dana Whitlock',
    })),
    events: [
      ...draft.events,
      {
        kind: 'submitted',
        revision: 1,
        at: '2026-04-06T09:30:00Z',
        byName: 'Dana Whitlock',
        comment: null,
      },
    ],
    allowedActions: ['approve', 'return'],
    ...overrides,
  });
}

/** The same tally approved as revision 1, now amended as revision 2 and waiting for review. */
export function amendedTally(): TallyDetail {
  const first = submittedTally().revisions[0];
  if (!first) throw new Error('the fixture has no first revision');
  const reason = 'Five baby blankets were counted twice.';
  return submittedTally({
    revision: 2,
    approvedRevision: 1,
    amendmentPending: true,
    version: 12,
    amendmentReason: reason,
    revisions: [
      {
        revision: 2,
        state: 'submitted',
        amendmentReason: reason,
        createdAt: '2026-05-02T10:00:00Z',
        createdByName: 'Dana Whitlock',
        submittedAt: '2026-05-02T11:00:00Z',
        submittedByName: 'Dana Whitlock',
        approvedAt: null,
        approvedByName: null,
      },
      {
        ...first,
        state: 'approved',
        approvedAt: '2026-04-08T15:00:00Z',
        approvedByName: 'Priya Castell',
      },
    ],
  });
}

/** A revision as `GET /api/tallies/:id/revisions/:n` answers it. */
export function revisionView(
  tally: TallyDetail,
  revision: number,
  values: TallyValues,
): TallyRevisionView {
  const found = tally.revisions.find((candidate) => candidate.revision === revision);
  if (!found) throw new Error(`the fixture has no revision ${revision}`);
  return { ...found, values, acknowledgedWarnings: [], acknowledgementNote: null };
}

const places = [
  { chapterId: 11, chapterName: 'Alder Falls', regionId: 1, regionName: 'North Ridge' },
  { chapterId: 21, chapterName: 'Brindle Bay', regionId: 2, regionName: 'Riverlands' },
];

/** Thirty submitted tallies across two chapters; the second is an amendment, the third late. */
export const queueTallies: TallySummary[] = Array.from({ length: 30 }, (_, index) => {
  const tally = submittedTally({
    id: 600 + index,
    ...places[index % places.length],
    month: `2025-${String((index % 12) + 1).padStart(2, '0')}`,
    amendmentPending: index === 1,
    reporting: index === 2 ? 'late' : 'on-time',
  });
  return { ...tally, headline: { ...tally.headline, panelsAccepted: 1_000 * (index + 1) } };
});

/** The server's answer to `GET /api/tallies` for this URL's page, over `tallies`. */
export function talliesPage(url: URL, tallies: TallySummary[] = queueTallies): TallyPage {
  const page = Number(url.searchParams.get('page') ?? '1');
  const pageSize = Number(url.searchParams.get('pageSize') ?? '25');
  return {
    items: tallies.slice((page - 1) * pageSize, page * pageSize),
    total: tallies.length,
    page,
    pageSize,
  };
}
