import type { ApiErrorBody, TallyConflictBody, TallyDetail, TallyValues } from '@tallyloom/core';
import {
  aTallyChapter,
  approvedTally,
  caller,
  consistentValues,
  createTally,
  storedTally,
  type TallyChapter,
} from './fixtures/tallies';
import { aRegion } from './support/network-builders';
import { signedIn } from './support/people-builders';
import { aBlanketSize, anAgency, auditedBy, fieldsNamed } from './support/setup-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(120_000);

describe('monthly tallies: saving, stale versions, concurrency and repeated submits', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });
  afterAll(() => testApp.close());

  const as = (token: string) => caller(testApp, token);

  /** A chapter's first tally (opening 60 panels, 2 blankets) and figures that pass every check. */
  async function aDraft(world?: TallyChapter) {
    const chapter = world ?? (await aTallyChapter(testApp));
    const tally = await createTally(testApp, chapter.lead.token, {
      chapterId: chapter.chapter.id,
      month: '2025-01',
      opening: { panels: 60, blankets: 2 },
    });
    const values = consistentValues(tally.values, {
      sizeId: chapter.size.id,
      agencyId: chapter.agency.id,
    });
    return { world: chapter, tally, values };
  }

  describe('bad figures', () => {
    let world: TallyChapter;
    let tally: TallyDetail;
    let values: TallyValues;

    beforeAll(async () => {
      ({ world, tally, values } = await aDraft());
    });

    /** A save that must be refused with 400 naming `field`; the stored tally stays as it was. */
    async function refusedSave(change: (v: TallyValues) => void, field: string, message: RegExp) {
      const before = await storedTally(testApp.app, tally.id);
      const sent = structuredClone(values);
      change(sent);
      const response = await as(world.lead.token).put(`/api/tallies/${tally.id}`, {
        version: tally.version,
        values: sent,
      });
      expect(response.status).toBe(400);
      const error = response.body as ApiErrorBody;
      expect(fieldsNamed(error)).toEqual([field]);
      expect(error.fields![0].messages.join(' ')).toMatch(message);
      expect(await storedTally(testApp.app, tally.id)).toEqual(before);
    }

    const WHOLE = /must be a whole number from 0 to 10,000,000/;
    it.each([
      [
        'a negative count',
        (v: TallyValues) => void (v.panels.usedInAssembly = -1),
        'values.panels.usedInAssembly',
        WHOLE,
      ],
      [
        'a fractional count',
        (v: TallyValues) => void (v.panels.closing = 40.5),
        'values.panels.closing',
        WHOLE,
      ],
      [
        'a count given as text',
        (v: TallyValues) => void (v.blankets.closing = '2' as never),
        'values.blankets.closing',
        WHOLE,
      ],
      [
        'a negative set-aside count',
        (v: TallyValues) => void (v.panels.setAside.other = -3),
        'values.panels.setAside.other',
        WHOLE,
      ],
      [
        'a fractional line count',
        (v: TallyValues) => void (v.blankets.given[0].count = 0.5),
        'values.blankets.given.0.count',
        WHOLE,
      ],
      [
        'a count beyond the ceiling',
        (v: TallyValues) => void (v.panels.accepted = 10_000_001),
        'values.panels.accepted',
        WHOLE,
      ],
      [
        'hours with 3 decimals',
        (v: TallyValues) => void (v.volunteerHours = 1.125),
        'values.volunteerHours',
        /at most 2 decimals/,
      ],
      [
        'negative hours',
        (v: TallyValues) => void (v.volunteerHours = -1),
        'values.volunteerHours',
        /from 0/,
      ],
      [
        'yarn of 0 kg',
        (v: TallyValues) => void (v.yarnDonated = { value: 0, unit: 'kg' }),
        'values.yarnDonated.value',
        /above 0/,
      ],
      [
        'yarn in ounces',
        (v: TallyValues) => void (v.yarnDonated = { value: 1, unit: 'oz' as never }),
        'values.yarnDonated.unit',
        /'kg' or 'lb'/,
      ],
      [
        'an unknown people group',
        (v: TallyValues) => void (v.peopleServed[0].group = 'pets' as never),
        'values.peopleServed.0.group',
        /must be one of/,
      ],
      [
        'notes over 5000 characters',
        (v: TallyValues) => void (v.notes = 'x'.repeat(5001)),
        'values.notes',
        /at most 5000/,
      ],
      [
        'a missing section',
        (v: TallyValues) => void delete (v as Partial<TallyValues>).blankets,
        'values.blankets',
        /must be an object/,
      ],
      [
        'an unknown field',
        (v: TallyValues) => void Object.assign(v, { mood: 'good' }),
        'values.mood',
        /should not exist/,
      ],
      [
        'a blanket size not in the catalogue',
        (v: TallyValues) => void (v.blankets.assembled[0].blanketSizeId = 999_999_999),
        'values.blankets.assembled.0.blanketSizeId',
        /No blanket size/,
      ],
      [
        'a size listed twice',
        (v: TallyValues) => void v.blankets.assembled.push({ ...v.blankets.assembled[0] }),
        'values.blankets.assembled.1',
        /listed twice/,
      ],
      [
        'a group listed twice for one agency',
        (v: TallyValues) => void v.peopleServed.push({ ...v.peopleServed[0] }),
        'values.peopleServed.1',
        /listed twice/,
      ],
    ])(
      'refuses %s (400 naming the field, nothing stored)',
      async (_what, change, field, message) => {
        await refusedSave(change, field, message);
      },
    );

    it('refuses an agency the chapter does not serve (400 naming the line)', async () => {
      const elsewhere = await anAgency().build(testApp.app);
      await refusedSave(
        (v) => void (v.peopleServed[0].partnerAgencyId = elsewhere.id),
        'values.peopleServed.0.partnerAgencyId',
        /not one that .* serves/,
      );
    });

    it('refuses an opening stock typed over the one carried from last month (400)', async () => {
      const january = await approvedTally(testApp, tally, values, {
        writer: world.lead.token,
        reviewer: world.coordinator.token,
      });
      const february = await createTally(testApp, world.lead.token, {
        chapterId: world.chapter.id,
        month: '2025-02',
      });
      expect(february.values.panels.opening).toBe(january.values.panels.closing);
      const before = await storedTally(testApp.app, february.id);
      const response = await as(world.lead.token).put(`/api/tallies/${february.id}`, {
        version: february.version,
        values: {
          ...february.values,
          panels: { ...february.values.panels, opening: february.values.panels.opening + 5 },
        },
      });
      expect(response.status).toBe(400);
      expect(fieldsNamed(response.body)).toEqual(['values.panels.opening']);
      expect(await storedTally(testApp.app, february.id)).toEqual(before);
      // The first tally's opening was typed in, so it could be changed while it was a draft.
      expect(january.openingEnteredByHand).toBe(true);
    });
  });

  it('saves an inconsistent draft (checks need not pass to save), and stores nothing for the same figures', async () => {
    const { world, tally, values } = await aDraft();
    const inconsistent = { ...values, panels: { ...values.panels, closing: 1 } };
    const saved = await as(world.lead.token).put(`/api/tallies/${tally.id}`, {
      version: 1,
      values: inconsistent,
    });
    expect(saved.status).toBe(200);
    const detail = saved.body as TallyDetail;
    expect(detail.version).toBe(2);
    expect(detail.checks.errors.map((e) => e.code)).toContain('panel-flow');
    const again = await as(world.lead.token).put(`/api/tallies/${tally.id}`, {
      version: 2,
      values: inconsistent,
    });
    expect(again.status).toBe(200);
    expect((again.body as TallyDetail).version).toBe(2);
    expect((await storedTally(testApp.app, tally.id)).audit).toEqual([
      'tally.created',
      'tally.saved',
    ]);
    // Submitting is where checks must pass: 422, with the error by field.
    const submit = await as(world.lead.token).post(`/api/tallies/${tally.id}/submit`, {
      version: 2,
      acknowledgedWarnings: [],
    });
    expect(submit.status).toBe(422);
    expect(fieldsNamed(submit.body)).toContain('panels.closing');
  });

  it('audits only the figures that changed', async () => {
    const { world, tally, values } = await aDraft();
    await as(world.lead.token).put(`/api/tallies/${tally.id}`, { version: 1, values }).expect(200);
    const requestId = `tally-audit-${tally.id}`;
    await testApp
      .http()
      .put(`/api/tallies/${tally.id}`)
      .set('Authorization', `Bearer ${world.lead.token}`)
      .set('X-Request-Id', requestId)
      .send({ version: 2, values: { ...values, volunteerHours: 9.75 } })
      .expect(200);
    expect(await auditedBy(testApp.app, requestId)).toEqual([
      expect.objectContaining({
        action: 'tally.saved',
        entityType: 'monthly_tally',
        entityId: String(tally.id),
        actorUserId: world.lead.user.id,
        before: { revision: 1, volunteerHours: 6.5 },
        after: { revision: 1, volunteerHours: 9.75 },
      }),
    ]);
  });

  it.each([
    ['submitted', /submitted tally cannot be edited/],
    ['approved', /start an amendment/],
  ] as const)('refuses editing a %s tally (409, nothing changed)', async (state, message) => {
    const { world, tally, values } = await aDraft();
    let current = (
      await as(world.lead.token).put(`/api/tallies/${tally.id}`, { version: 1, values })
    ).body as TallyDetail;
    current = (
      await as(world.lead.token).post(`/api/tallies/${tally.id}/submit`, {
        version: current.version,
        acknowledgedWarnings: [],
      })
    ).body as TallyDetail;
    if (state === 'approved')
      current = (
        await as(world.coordinator.token).post(`/api/tallies/${tally.id}/approve`, {
          version: current.version,
        })
      ).body as TallyDetail;
    expect(current.state).toBe(state);
    const before = await storedTally(testApp.app, tally.id);
    const response = await as(world.lead.token).put(`/api/tallies/${tally.id}`, {
      version: current.version,
      values: { ...values, volunteerHours: 99 },
    });
    expect(response.status).toBe(409);
    expect((response.body as ApiErrorBody).message).toMatch(message);
    expect(await storedTally(testApp.app, tally.id)).toEqual(before);
  });

  it('answers a stale version with 409 and the tally as it is now, changing nothing', async () => {
    const { world, tally, values } = await aDraft();
    const first = await as(world.lead.token).put(`/api/tallies/${tally.id}`, {
      version: 1,
      values,
    });
    expect(first.status).toBe(200);
    const before = await storedTally(testApp.app, tally.id);
    const stale = await as(world.lead.token).put(`/api/tallies/${tally.id}`, {
      version: 1,
      values: { ...values, volunteerHours: 1 },
    });
    expect(stale.status).toBe(409);
    const body = stale.body as TallyConflictBody;
    expect(body.message).toMatch(/version 2/);
    expect(body.current.version).toBe(2);
    expect(body.current.values).toEqual(values);
    expect(await storedTally(testApp.app, tally.id)).toEqual(before);
    // A stale transition is answered the same way.
    const staleSubmit = await as(world.lead.token).post(`/api/tallies/${tally.id}/submit`, {
      version: 1,
      acknowledgedWarnings: [],
    });
    expect(staleSubmit.status).toBe(409);
    expect((staleSubmit.body as TallyConflictBody).current.state).toBe('draft');
    expect(await storedTally(testApp.app, tally.id)).toEqual(before);
  });

  it('lets exactly one of two writers with the same version win; the other gets 409 with its figures', async () => {
    const { world, tally, values } = await aDraft();
    const mine = { ...values, volunteerHours: 11, notes: 'Saved by the lead' };
    const theirs = { ...values, volunteerHours: 22, notes: 'Saved by national staff' };
    const staff = await signedIn(testApp, 'national_staff');
    const responses = await Promise.all([
      as(world.lead.token).put(`/api/tallies/${tally.id}`, { version: 1, values: mine }),
      as(staff.token).put(`/api/tallies/${tally.id}`, { version: 1, values: theirs }),
    ]);
    expect(responses.map((r) => r.status).sort()).toEqual([200, 409]);
    const winner = responses[0].status === 200 ? mine : theirs;
    const loser = responses.find((r) => r.status === 409)!.body as TallyConflictBody;
    expect(loser.current.values).toEqual(winner);
    expect(loser.current.version).toBe(2);
    const stored = (await as(world.lead.token).get(`/api/tallies/${tally.id}`).expect(200))
      .body as TallyDetail;
    expect(stored.values).toEqual(winner);
    expect(stored.version).toBe(2);
    expect((await storedTally(testApp.app, tally.id)).audit).toEqual([
      'tally.created',
      'tally.saved',
    ]);
  });

  it('saves many tallies at the same moment without one writer blocking another', async () => {
    // Each save replaces its tally's lines (delete, then insert); writers of different tallies
    // must not deadlock on each other's index gaps.
    let built = aRegion().named('Tally Rush');
    for (let i = 0; i < 6; i++) built = built.withChapter(`Rush ${i}`);
    const { chapters } = await built.build(testApp.app);
    const agency = await anAgency()
      .servedBy(...chapters.map((c) => c.id))
      .build(testApp.app);
    const staff = (await signedIn(testApp, 'national_staff')).token;
    const { size } = await aTallyChapter(testApp);
    let tallies: TallyDetail[] = [];
    for (const chapter of chapters)
      tallies.push(await createTally(testApp, staff, { chapterId: chapter.id, month: '2025-01' }));
    for (let round = 1; round <= 4; round++) {
      const responses = await Promise.all(
        tallies.map((tally) =>
          as(staff).put(`/api/tallies/${tally.id}`, {
            version: tally.version,
            values: {
              ...tally.values,
              blankets: {
                ...tally.values.blankets,
                assembled: [{ blanketSizeId: size.id, count: round }],
                given: [{ blanketSizeId: size.id, partnerAgencyId: agency.id, count: round }],
              },
              peopleServed: [{ partnerAgencyId: agency.id, group: 'adults', count: round }],
            },
          }),
        ),
      );
      expect(responses.map((response) => response.status)).toEqual(tallies.map(() => 200));
      tallies = responses.map((response) => response.body as TallyDetail);
    }
    expect(tallies.map((tally) => [tally.version, tally.headline.blanketsGiven])).toEqual(
      tallies.map(() => [5, 4]),
    );
  });

  describe('submitting with an Idempotency-Key', () => {
    async function aSaved() {
      const { world, tally, values } = await aDraft();
      const saved = (
        await as(world.lead.token).put(`/api/tallies/${tally.id}`, { version: 1, values })
      ).body as TallyDetail;
      return { world, saved };
    }
    const submit = (token: string, id: number, key: string, version: number) =>
      testApp
        .http()
        .post(`/api/tallies/${id}/submit`)
        .set('Authorization', `Bearer ${token}`)
        .set('Idempotency-Key', key)
        .send({ version, acknowledgedWarnings: [] });

    it('makes one submission of the same key sent twice in a row', async () => {
      const { world, saved } = await aSaved();
      const key = `submit-${saved.id}-a`;
      const first = await submit(world.lead.token, saved.id, key, saved.version);
      const second = await submit(world.lead.token, saved.id, key, saved.version);
      expect([first.status, second.status]).toEqual([200, 200]);
      const [a, b] = [first.body as TallyDetail, second.body as TallyDetail];
      expect([b.state, b.revision, b.version]).toEqual([a.state, a.revision, a.version]);
      expect(a.state).toBe('submitted');
      const stored = await storedTally(testApp.app, saved.id);
      expect(stored.events.filter((kind) => kind === 'submitted')).toHaveLength(1);
      expect(stored.audit.filter((action) => action === 'tally.submitted')).toHaveLength(1);
      expect(stored.revisions[0]).toMatchObject({ submissionKey: key });
    });

    it('makes one submission of the same key sent twice at once', async () => {
      const { world, saved } = await aSaved();
      const key = `submit-${saved.id}-b`;
      const responses = await Promise.all([
        submit(world.lead.token, saved.id, key, saved.version),
        submit(world.lead.token, saved.id, key, saved.version),
      ]);
      expect(responses.map((r) => r.status)).toEqual([200, 200]);
      const stored = await storedTally(testApp.app, saved.id);
      expect(stored.events).toEqual(['created', 'submitted']);
      expect(stored.audit).toEqual(['tally.created', 'tally.saved', 'tally.submitted']);
      expect(stored.version).toBe(saved.version + 1);
    });

    it('treats a different key as a new submission (refused: already submitted)', async () => {
      const { world, saved } = await aSaved();
      await submit(world.lead.token, saved.id, `submit-${saved.id}-c`, saved.version).expect(200);
      const other = await submit(
        world.lead.token,
        saved.id,
        `submit-${saved.id}-d`,
        saved.version + 1,
      );
      expect(other.status).toBe(409);
      expect((await storedTally(testApp.app, saved.id)).events).toEqual(['created', 'submitted']);
    });

    it('refuses a key that is too long or has spaces (400 naming the header)', async () => {
      const { world, saved } = await aSaved();
      for (const key of ['x'.repeat(129), 'two words']) {
        const response = await submit(world.lead.token, saved.id, key, saved.version);
        expect(response.status).toBe(400);
        expect(fieldsNamed(response.body)).toEqual(['Idempotency-Key']);
      }
      expect((await storedTally(testApp.app, saved.id)).state).toBe('draft');
    });
  });

  it("checks a count against the chapter's own approved history (plausibility)", async () => {
    const world = await aTallyChapter(testApp, '2024-01-01');
    const lines = { sizeId: world.size.id, agencyId: world.agency.id };
    const hours = [10, 12, 11, 13, 12, 11];
    let opening: { panels: number; blankets: number } | undefined = { panels: 200, blankets: 0 };
    for (const [index, volunteerHours] of hours.entries()) {
      const month = `2024-${String(index + 1).padStart(2, '0')}`;
      const created = await createTally(testApp, world.lead.token, {
        chapterId: world.chapter.id,
        month,
        ...(opening ? { opening } : {}),
      });
      opening = undefined;
      await approvedTally(
        testApp,
        created,
        { ...consistentValues(created.values, lines), volunteerHours },
        { writer: world.lead.token, reviewer: world.coordinator.token },
      );
    }
    const july = await createTally(testApp, world.lead.token, {
      chapterId: world.chapter.id,
      month: '2024-07',
    });
    expect(july.checkContext.history.map((h) => [h.month, h.volunteerHours])).toEqual([
      ['2024-01', 10],
      ['2024-02', 12],
      ['2024-03', 11],
      ['2024-04', 13],
      ['2024-05', 12],
      ['2024-06', 11],
    ]);
    const saved = (
      await as(world.lead.token).put(`/api/tallies/${july.id}`, {
        version: july.version,
        values: { ...consistentValues(july.values, lines), volunteerHours: 80 },
      })
    ).body as TallyDetail;
    expect(saved.checks.warnings.map((w) => w.code)).toEqual(['implausible.volunteerHours']);
    const score = saved.checks.plausibility.find((p) => p.count === 'volunteerHours');
    // Source: Iglewicz and Hoaglin (1993), modified z-score M = 0.6745 (x − median) / MAD.
    // History 10, 12, 11, 13, 12, 11: median 11.5, MAD 0.5; M = 0.6745 × (80 − 11.5) / 0.5.
    expect(score).toMatchObject({ median: 11.5, mad: 0.5, flagged: true, method: 'mad' });
    expect(score!.score).toBeCloseTo(92.4065, 3);
  });

  it('refuses a retired blanket size only when it is unknown, not when it is merely retired', async () => {
    const { world, tally, values } = await aDraft();
    const retired = await aBlanketSize().withGrid(4, 5).inactive().build(testApp.app);
    const response = await as(world.lead.token).put(`/api/tallies/${tally.id}`, {
      version: 1,
      values: {
        ...values,
        blankets: {
          ...values.blankets,
          assembled: [{ blanketSizeId: retired.id, count: 1 }],
          given: [{ blanketSizeId: retired.id, partnerAgencyId: world.agency.id, count: 1 }],
        },
      },
    });
    expect(response.status).toBe(200);
    expect((response.body as TallyDetail).checkContext.blanketSizes).toContainEqual({
      id: retired.id,
      name: retired.name,
      panels: 20,
    });
  });
});
