import type { ApiErrorBody, TallyDetail, TallyRevisionView, TallyValues } from '@tallyloom/core';
import {
  aTallyChapter,
  approvedTally,
  caller,
  consistentValues,
  createTally,
  storedTally,
  type TallyChapter,
} from './fixtures/tallies';
import { createReceipt, receiptInput } from './fixtures/receipts';
import { signedIn } from './support/people-builders';
import { fieldsNamed } from './support/setup-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(120_000);

describe('monthly tallies: the review flow', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });
  afterAll(() => testApp.close());

  const as = (token: string) => caller(testApp, token);

  /** A draft whose figures pass every check, ready to submit. */
  async function aCleanDraft(world: TallyChapter, month = '2025-01'): Promise<TallyDetail> {
    const created = await createTally(testApp, world.lead.token, {
      chapterId: world.chapter.id,
      month,
      opening: { panels: 60, blankets: 2 },
    });
    const values = consistentValues(created.values, {
      sizeId: world.size.id,
      agencyId: world.agency.id,
    });
    const saved = await as(world.lead.token).put(`/api/tallies/${created.id}`, {
      version: created.version,
      values,
    });
    expect(saved.status).toBe(200);
    return saved.body as TallyDetail;
  }

  async function submitted(world: TallyChapter, token = world.lead.token): Promise<TallyDetail> {
    const draft = await aCleanDraft(world);
    const response = await as(token).post(`/api/tallies/${draft.id}/submit`, {
      version: draft.version,
      acknowledgedWarnings: [],
    });
    expect(response.status).toBe(200);
    return response.body as TallyDetail;
  }

  /** A refused transition: the status, the message, and the tally exactly as it was. */
  async function refused(
    token: string,
    tally: TallyDetail,
    step: 'submit' | 'approve' | 'return' | 'amend',
    body: object,
    status: number,
    message: RegExp,
  ): Promise<void> {
    const before = await storedTally(testApp.app, tally.id);
    const response = await as(token).post(`/api/tallies/${tally.id}/${step}`, body);
    expect(response.status).toBe(status);
    expect((response.body as ApiErrorBody).message).toMatch(message);
    expect(await storedTally(testApp.app, tally.id)).toEqual(before);
  }

  it('files, returns, resubmits, approves and amends a tally, keeping every revision', async () => {
    const world = await aTallyChapter(testApp, '2025-01-01');
    const lead = as(world.lead.token);
    const coordinator = as(world.coordinator.token);
    await createReceipt(
      testApp,
      world.lead.token,
      receiptInput(world.chapter.id, {
        receivedOn: '2025-02-12',
        panelsAccepted: 45,
        setAside: { offSize: 2, hardCareYarn: 0, soiledOrDamaged: 0, other: 0 },
      }),
    );

    // 1. Start February: prefilled from the receipt, opening typed in (the chapter's first tally).
    const created = await createTally(testApp, world.lead.token, {
      chapterId: world.chapter.id,
      month: '2025-02',
      opening: { panels: 15, blankets: 1 },
    });
    expect(created.values.panels).toEqual({
      opening: 15,
      accepted: 45,
      setAside: { offSize: 2, hardCareYarn: 0, soiledOrDamaged: 0, other: 0 },
      usedInAssembly: 0,
      closing: 60,
    });

    // 2. Save: people served with no blankets given out this month is a warning, not an error.
    const first: TallyValues = {
      ...created.values,
      panels: { ...created.values.panels, usedInAssembly: 40, closing: 20 },
      blankets: {
        opening: 1,
        assembled: [{ blanketSizeId: world.size.id, count: 2 }],
        received: 0,
        given: [],
        closing: 3,
      },
      peopleServed: [{ partnerAgencyId: world.agency.id, group: 'infants', count: 4 }],
      volunteerHours: 12.25,
      yarnDonated: { value: 2, unit: 'lb' },
      notes: '  Two baby blankets finished at the sewing day.  ',
    };
    const saved = await lead.put(`/api/tallies/${created.id}`, { version: 1, values: first });
    expect(saved.status).toBe(200);
    const draft = saved.body as TallyDetail;
    expect(draft.version).toBe(2);
    expect(draft.values).toEqual({
      ...first,
      notes: 'Two baby blankets finished at the sewing day.',
    });
    expect(draft.checks.errors).toEqual([]);
    expect(draft.checks.warnings.map((w) => w.code)).toEqual(['people-served-without-blankets']);

    // 3. Submit without acknowledging the warning: 422 naming it, nothing stored.
    const before = await storedTally(testApp.app, created.id);
    const unacknowledged = await lead.post(`/api/tallies/${created.id}/submit`, {
      version: 2,
      acknowledgedWarnings: [],
    });
    expect(unacknowledged.status).toBe(422);
    expect(fieldsNamed(unacknowledged.body)).toEqual(['peopleServed', 'acknowledgementNote']);
    expect(JSON.stringify(unacknowledged.body)).toContain('Acknowledge this warning');
    expect(await storedTally(testApp.app, created.id)).toEqual(before);

    // 4. Submit with the acknowledgement and a note.
    const sent = await lead.post(`/api/tallies/${created.id}/submit`, {
      version: 2,
      acknowledgedWarnings: ['people-served-without-blankets'],
      acknowledgementNote: 'The ward took blankets from last month’s stock.',
    });
    expect(sent.status).toBe(200);
    expect(sent.body).toMatchObject({
      state: 'submitted',
      version: 3,
      acknowledgedWarnings: ['people-served-without-blankets'],
      acknowledgementNote: 'The ward took blankets from last month’s stock.',
      allowedActions: [],
    });
    expect((sent.body as TallyDetail).firstSubmittedAt).not.toBeNull();
    const forReview = (await coordinator.get(`/api/tallies/${created.id}`).expect(200))
      .body as TallyDetail;
    expect(forReview.allowedActions).toEqual(['approve', 'return']);

    // 5. The coordinator returns it with a comment.
    const returned = await coordinator.post(`/api/tallies/${created.id}/return`, {
      version: 3,
      comment: '  Please add the volunteer hours of the sewing day.  ',
    });
    expect(returned.status).toBe(200);
    expect(returned.body).toMatchObject({
      state: 'returned',
      version: 4,
      returnComment: 'Please add the volunteer hours of the sewing day.',
    });

    // 6. The lead fixes it and submits again; the first submission stays the one that counts.
    const fixed = await lead.put(`/api/tallies/${created.id}`, {
      version: 4,
      values: { ...first, volunteerHours: 18.5 },
    });
    expect(fixed.status).toBe(200);
    expect((fixed.body as TallyDetail).state).toBe('returned');
    const resent = await lead.post(`/api/tallies/${created.id}/submit`, {
      version: 5,
      acknowledgedWarnings: ['people-served-without-blankets'],
      acknowledgementNote: 'Hours added; the ward took blankets from stock.',
    });
    expect(resent.status).toBe(200);
    expect((resent.body as TallyDetail).firstSubmittedAt).toBe(
      (sent.body as TallyDetail).firstSubmittedAt,
    );

    // 7. The coordinator approves.
    const approved = await coordinator.post(`/api/tallies/${created.id}/approve`, {
      version: 6,
      comment: 'Thank you.',
    });
    expect(approved.status).toBe(200);
    expect(approved.body).toMatchObject({
      state: 'approved',
      version: 7,
      revision: 1,
      approvedRevision: 1,
      amendmentPending: false,
      approvedByName: world.coordinator.user.displayName,
      returnComment: null,
    });

    // 8. The lead amends it with a reason: revision 2, a draft copy; reports still read revision 1.
    const amended = await lead.post(`/api/tallies/${created.id}/amend`, {
      version: 7,
      reason: 'One more baby blanket was handed over on the last day.',
    });
    expect(amended.status).toBe(200);
    const amendment = amended.body as TallyDetail;
    expect(amendment).toMatchObject({
      state: 'draft',
      revision: 2,
      approvedRevision: 1,
      amendmentPending: true,
      amendmentReason: 'One more baby blanket was handed over on the last day.',
      version: 8,
    });
    expect(amendment.values).toEqual((approved.body as TallyDetail).values);

    // 9. Revision 2 gets its own figures; revision 1 is still readable as it was approved.
    const second: TallyValues = {
      ...amendment.values,
      blankets: {
        ...amendment.values.blankets,
        given: [{ blanketSizeId: world.size.id, partnerAgencyId: world.agency.id, count: 2 }],
        closing: 1,
      },
    };
    expect(
      (await lead.put(`/api/tallies/${created.id}`, { version: 8, values: second })).status,
    ).toBe(200);
    const revision1 = (await lead.get(`/api/tallies/${created.id}/revisions/1`).expect(200))
      .body as TallyRevisionView;
    const revision2 = (await lead.get(`/api/tallies/${created.id}/revisions/2`).expect(200))
      .body as TallyRevisionView;
    expect(revision1).toMatchObject({ revision: 1, state: 'approved', amendmentReason: null });
    expect(revision1.values.blankets.given).toEqual([]);
    expect(revision2).toMatchObject({ revision: 2, state: 'draft' });
    expect(revision2.values.blankets.given).toEqual(second.blankets.given);

    // 10. The amendment is submitted (no warning left) and approved: revision 1 is superseded.
    const amendmentSent = await lead.post(`/api/tallies/${created.id}/submit`, {
      version: 9,
      acknowledgedWarnings: [],
    });
    expect(amendmentSent.status).toBe(200);
    const reapproved = await coordinator.post(`/api/tallies/${created.id}/approve`, {
      version: 10,
    });
    expect(reapproved.status).toBe(200);
    const final = reapproved.body as TallyDetail;
    expect(final).toMatchObject({
      state: 'approved',
      revision: 2,
      approvedRevision: 2,
      amendmentPending: false,
    });
    expect(final.revisions.map((r) => [r.revision, r.state])).toEqual([
      [1, 'superseded'],
      [2, 'approved'],
    ]);
    expect(final.events.map((e) => [e.kind, e.revision, e.comment])).toEqual([
      ['created', 1, null],
      ['submitted', 1, 'The ward took blankets from last month’s stock.'],
      ['returned', 1, 'Please add the volunteer hours of the sewing day.'],
      ['submitted', 1, 'Hours added; the ward took blankets from stock.'],
      ['approved', 1, 'Thank you.'],
      ['amendment_started', 2, 'One more baby blanket was handed over on the last day.'],
      ['submitted', 2, null],
      ['approved', 2, null],
    ]);
    expect(final.events[0].byName).toBe(world.lead.user.displayName);
    expect(final.events[4].byName).toBe(world.coordinator.user.displayName);

    // 11. Every transition and edit left its audit entry.
    expect((await storedTally(testApp.app, created.id)).audit).toEqual([
      'tally.created',
      'tally.saved',
      'tally.submitted',
      'tally.returned',
      'tally.saved',
      'tally.submitted',
      'tally.approved',
      'tally.amendment_started',
      'tally.saved',
      'tally.submitted',
      'tally.approved',
    ]);
  });

  it("carries an approved month's closing stock into the next month as approved", async () => {
    const world = await aTallyChapter(testApp, '2025-01-01');
    const january = await createTally(testApp, world.lead.token, {
      chapterId: world.chapter.id,
      month: '2025-01',
      opening: { panels: 30, blankets: 4 },
    });
    const values = consistentValues(january.values, {
      sizeId: world.size.id,
      agencyId: world.agency.id,
    });
    await approvedTally(testApp, january, values, {
      writer: world.lead.token,
      reviewer: world.coordinator.token,
    });
    const february = await createTally(testApp, world.lead.token, {
      chapterId: world.chapter.id,
      month: '2025-02',
    });
    expect(february.openingEnteredByHand).toBe(false);
    expect(february.checkContext.expectedOpening).toEqual({
      panels: values.panels.closing,
      blankets: values.blankets.closing,
      fromMonth: '2025-01',
      approved: true,
    });
    expect(february.values.panels.opening).toBe(10);
    expect(february.values.blankets.opening).toBe(4);
    expect(february.checks.warnings.map((w) => w.code)).not.toContain('opening-not-approved');
  });

  describe('refused steps', () => {
    it('refuses a chapter lead approving (403), even their own chapter', async () => {
      const world = await aTallyChapter(testApp);
      const tally = await submitted(world);
      await refused(world.lead.token, tally, 'approve', { version: tally.version }, 403, /role/);
    });

    it('refuses approving a tally one submitted oneself (403)', async () => {
      const world = await aTallyChapter(testApp);
      const staff = await signedIn(testApp, 'national_staff');
      const draft = await aCleanDraft(world);
      const sent = await as(staff.token).post(`/api/tallies/${draft.id}/submit`, {
        version: draft.version,
        acknowledgedWarnings: [],
      });
      expect(sent.status).toBe(200);
      const tally = sent.body as TallyDetail;
      expect(tally.allowedActions).toEqual(['return']);
      await refused(
        staff.token,
        tally,
        'approve',
        { version: tally.version },
        403,
        /You cannot approve a tally you submitted/,
      );
      // Another reviewer may.
      await as(world.coordinator.token)
        .post(`/api/tallies/${tally.id}/approve`, { version: tally.version })
        .expect(200);
    });

    /** A tally of its own chapter in the state a test needs. */
    async function inState(world: TallyChapter, state: 'draft' | 'submitted' | 'approved') {
      if (state === 'draft') return aCleanDraft(world);
      const sent = await submitted(world);
      if (state === 'submitted') return sent;
      return (
        await as(world.coordinator.token)
          .post(`/api/tallies/${sent.id}/approve`, { version: sent.version })
          .expect(200)
      ).body as TallyDetail;
    }

    it.each([
      ['approve a draft', 'draft', 'approve', /Only a submitted tally can be approved/],
      ['return a draft', 'draft', 'return', /Only a submitted tally can be returned/],
      ['amend a draft', 'draft', 'amend', /Only an approved tally can be amended/],
      ['amend a submitted tally', 'submitted', 'amend', /Only an approved tally can be amended/],
      ['submit a submitted tally', 'submitted', 'submit', /Only a draft or returned tally/],
      ['return an approved tally', 'approved', 'return', /Only a submitted tally can be returned/],
      [
        'approve an approved tally',
        'approved',
        'approve',
        /Only a submitted tally can be approved/,
      ],
      ['submit an approved tally', 'approved', 'submit', /Only a draft or returned tally/],
    ] as const)('refuses to %s (409, nothing changed)', async (_what, state, step, message) => {
      const world = await aTallyChapter(testApp);
      const tally = await inState(world, state);
      const reviewing = step === 'approve' || step === 'return';
      const body =
        step === 'return'
          ? { version: tally.version, comment: 'Please recount.' }
          : step === 'amend'
            ? { version: tally.version, reason: 'A late parcel.' }
            : step === 'submit'
              ? { version: tally.version, acknowledgedWarnings: [] }
              : { version: tally.version };
      await refused(
        reviewing ? world.coordinator.token : world.lead.token,
        tally,
        step,
        body,
        409,
        message,
      );
    });

    it.each([
      ['return', { version: 3 }, 'comment'],
      ['return', { version: 3, comment: '   ' }, 'comment'],
      ['return', { version: 3, comment: 'x'.repeat(2001) }, 'comment'],
      ['amend', { version: 3, reason: '' }, 'reason'],
      ['approve', { version: 0 }, 'version'],
      ['approve', { version: '3' }, 'version'],
    ] as const)('refuses %s with %j (400 naming the field)', async (step, body, field) => {
      const world = await aTallyChapter(testApp);
      const tally = await submitted(world);
      const token = step === 'amend' ? world.lead.token : world.coordinator.token;
      const before = await storedTally(testApp.app, tally.id);
      const response = await as(token).post(`/api/tallies/${tally.id}/${step}`, body);
      expect(response.status).toBe(400);
      expect(fieldsNamed(response.body)).toEqual([field]);
      expect(await storedTally(testApp.app, tally.id)).toEqual(before);
    });
  });
});
