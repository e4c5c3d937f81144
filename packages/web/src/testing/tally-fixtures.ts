import {
  addMonths,
  HEADLINE_COUNTS,
  type HeadlineCount,
  type TallyCalendar,
  type TallyDetail,
  type TallyPage,
  type TallyRevisionView,
  type TallySummary,
  type TallyValues,
} from '@tallyloom/core';

// Invented figures of the demo chapter Alder Falls (BRIEF §7) for the tally form's tests.
// March 2026 adds up: panels 120 + 1,480 − 1,400 = 200; blankets 4 + 52 + 2 − 50 = 8.

export function marchValues(): TallyValues {
  return {
    panels: {
      opening: 120,
      accepted: 1_480,
      setAside: { offSize: 12, hardCareYarn: 3, soiledOrDamaged: 0, other: 0 },
      usedInAssembly: 1_400,
      closing: 200,
    },
    receiptsDifferenceReason: null,
    blankets: {
      opening: 4,
      assembled: [
        { blanketSizeId: 1, count: 12 },
        { blanketSizeId: 3, count: 40 },
      ],
      received: 2,
      given: [
        { blanketSizeId: 1, partnerAgencyId: 33, count: 12 },
        { blanketSizeId: 3, partnerAgencyId: 31, count: 38 },
      ],
      closing: 8,
    },
    peopleServed: [
      { partnerAgencyId: 31, group: 'children', count: 8 },
      { partnerAgencyId: 31, group: 'adults', count: 30 },
      { partnerAgencyId: 33, group: 'infants', count: 12 },
    ],
    volunteerHours: 212.5,
    yarnDonated: { value: 4.5, unit: 'kg' },
    notes: null,
  };
}

// A steady year around March's figures, so that nothing in March looks unusual.
const spread = [-6, -3, 0, 3, 6, -4, 1, 4, -1, -6, 3, 0];
const centre: Record<HeadlineCount, number> = {
  panelsAccepted: 1_480,
  panelsUsed: 1_400,
  blanketsAssembled: 52,
  blanketsGiven: 50,
  peopleServed: 50,
  volunteerHours: 212.5,
};

const history: TallyDetail['checkContext']['history'] = spread.map((offset, index) => ({
  month: addMonths('2025-03', index),
  ...(Object.fromEntries(
    HEADLINE_COUNTS.map((count) => [
      count,
      centre[count] + offset * (centre[count] > 100 ? 10 : 1),
    ]),
  ) as Record<HeadlineCount, number>),
}));

/** Alder Falls' March 2026 tally as a draft its chapter lead may edit and submit. */
export function draftTally(overrides: Partial<TallyDetail> = {}): TallyDetail {
  const values = marchValues();
  return {
    id: 501,
    chapterId: 11,
    chapterName: 'Alder Falls',
    regionId: 1,
    regionName: 'North Ridge',
    month: '2026-03',
    state: 'draft',
    revision: 1,
    approvedRevision: null,
    amendmentPending: false,
    dueOn: '2026-04-10',
    reporting: 'due',
    firstSubmittedAt: null,
    submittedAt: null,
    approvedAt: null,
    approvedByName: null,
    openingEnteredByHand: false,
    headline: {
      panelsAccepted: 1_480,
      blanketsAssembled: 52,
      blanketsGiven: 50,
      peopleServed: 50,
      volunteerHours: 212.5,
    },
    version: 3,
    updatedAt: '2026-04-02T13:45:00Z',
    values,
    checkContext: {
      month: '2026-03',
      receipts: {
        count: 14,
        panelsAccepted: 1_480,
        setAside: { offSize: 12, hardCareYarn: 3, soiledOrDamaged: 0, other: 0 },
        finishedBlankets: 2,
      },
      blanketSizes: [
        { id: 1, name: 'Baby', panels: 16 },
        { id: 3, name: 'Lap', panels: 30 },
      ],
      expectedOpening: { panels: 120, blankets: 4, fromMonth: '2026-02', approved: true },
      history,
      servedPerBlanketWarnFactor: 3,
    },
    checks: { errors: [], warnings: [], infos: [], panelsInProgress: 8, plausibility: [] },
    acknowledgedWarnings: [],
    acknowledgementNote: null,
    amendmentReason: null,
    returnComment: null,
    revisions: [
      {
        revision: 1,
        state: 'draft',
        amendmentReason: null,
        createdAt: '2026-04-01T08:00:00Z',
        createdByName: 'Dana Whitlock',
        submittedAt: null,
        submittedByName: null,
        approvedAt: null,
        approvedByName: null,
      },
    ],
    events: [
      {
        kind: 'created',
        revision: 1,
        at: '2026-04-01T08:00:00Z',
        byName: 'Dana Whitlock',
        comment: null,
      },
    ],
    agencies: [
      { id: 31, name: 'Maple Street Family Shelter', kind: 'family_shelter' },
      { id: 33, name: 'Coastal County Neonatal Unit', kind: 'neonatal_or_childrens_ward' },
    ],
    allowedActions: ['edit', 'submit'],
    ...overrides,
  };
}

// The review side: the same March tally submitted, approved and amended, and a queue of others.
const SUBMITTED_AT = '2026-04-06T09:30:00Z';
const APPROVED_AT = '2026-04-08T15:10:00Z';

/** Submitted with one warning the lead acknowledged, and Approve and Return open to the reader. */
export function submittedTally(overrides: Partial<TallyDetail> = {}): TallyDetail {
  const draft = draftTally();
  return draftTally({
    state: 'submitted',
    reporting: 'on-time',
    firstSubmittedAt: SUBMITTED_AT,
    submittedAt: SUBMITTED_AT,
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
      submittedAt: SUBMITTED_AT,
      submittedByName: 'Dana Whitlock',
    })),
    events: [
      ...draft.events,
      {
        kind: 'submitted',
        revision: 1,
        at: SUBMITTED_AT,
        byName: 'Dana Whitlock',
        comment: null,
      },
    ],
    allowedActions: ['approve', 'return'],
    ...overrides,
  });
}

/** The same tally approved as revision 1: read-only, and amendable by its chapter lead. */
export function approvedTally(overrides: Partial<TallyDetail> = {}): TallyDetail {
  const submitted = submittedTally();
  return submittedTally({
    state: 'approved',
    approvedRevision: 1,
    approvedAt: APPROVED_AT,
    approvedByName: 'Priya Castell',
    allowedActions: ['amend'],
    revisions: submitted.revisions.map((revision) => ({
      ...revision,
      state: 'approved',
      approvedAt: APPROVED_AT,
      approvedByName: 'Priya Castell',
    })),
    events: [
      ...submitted.events,
      {
        kind: 'approved',
        revision: 1,
        at: APPROVED_AT,
        byName: 'Priya Castell',
        comment: 'Thank you.',
      },
    ],
    ...overrides,
  });
}

/** The same tally approved as revision 1, now amended as revision 2 and waiting for review. */
export function amendedTally(): TallyDetail {
  const first = approvedTally().revisions[0];
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
      first,
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

/** Alder Falls' recent months as its chapter lead's home shows them. */
export const alderFallsCalendar: TallyCalendar = {
  today: '2026-05-04',
  entries: [
    {
      chapterId: 11,
      chapterName: 'Alder Falls',
      month: '2026-04',
      dueOn: '2026-05-10',
      reporting: 'due',
      tallyId: null,
      state: null,
      amendmentPending: false,
      returnComment: null,
    },
    {
      chapterId: 11,
      chapterName: 'Alder Falls',
      month: '2026-03',
      dueOn: '2026-04-10',
      reporting: 'late',
      tallyId: 501,
      state: 'returned',
      amendmentPending: false,
      returnComment:
        'Blankets given out do not match the shelter’s receipt; please recount the lap blankets.',
    },
    {
      chapterId: 11,
      chapterName: 'Alder Falls',
      month: '2026-02',
      dueOn: '2026-03-10',
      reporting: 'on-time',
      tallyId: 488,
      state: 'approved',
      amendmentPending: false,
      returnComment: null,
    },
    {
      chapterId: 11,
      chapterName: 'Alder Falls',
      month: '2026-01',
      dueOn: '2026-02-10',
      reporting: 'on-time',
      tallyId: 470,
      state: 'draft',
      amendmentPending: true,
      returnComment: null,
    },
  ],
};
