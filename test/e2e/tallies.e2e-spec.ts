import { getModelToken } from '@nestjs/sequelize';
import {
  addMonths,
  monthOf,
  type ApiErrorBody,
  type TallyCalendar,
  type TallyDetail,
  type TallyPage,
  type TallyRevisionView,
} from '@tallyloom/core';
import { MonthlyTally } from '../../services/api/src/tallies/models/monthly-tally.model';
import { createReceipt, receiptInput } from './fixtures/receipts';
import {
  aTallyChapter,
  approvedTally,
  caller,
  consistentValues,
  createTally,
  storedTally,
  type TallyChapter,
} from './fixtures/tallies';
import { signedIn } from './support/people-builders';
import { fieldsNamed } from './support/setup-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(90_000);

/** The month `n` months from the current one (UTC). */
const monthFromNow = (n: number) => addMonths(monthOf(new Date().toISOString()), n);

describe('monthly tallies: starting one, reading, lists and the calendar', () => {
  let testApp: TestApp;
  let tallies: typeof MonthlyTally;
  let staff: string;
  let admin: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    tallies = testApp.app.get<typeof MonthlyTally>(getModelToken(MonthlyTally));
    staff = (await signedIn(testApp, 'national_staff')).token;
    admin = (await signedIn(testApp, 'network_admin')).token;
  });
  afterAll(() => testApp.close());

  const as = (token: string) => caller(testApp, token);
  const countFor = (chapterId: number) => tallies.count({ where: { chapterId } });

  /** Posts a tally that must be refused; checks status, the field named, and that nothing was stored. */
  async function refusedCreate(
    token: string,
    body: Record<string, unknown>,
    status: number,
    field: string,
    message: RegExp,
  ): Promise<void> {
    const chapterId = body.chapterId as number;
    const before = await countFor(chapterId);
    const response = await as(token).post('/api/tallies', body);
    expect(response.status).toBe(status);
    const error = response.body as ApiErrorBody;
    expect(fieldsNamed(error)).toEqual([field]);
    expect(error.fields![0].messages.join(' ')).toMatch(message);
    expect(await countFor(chapterId)).toBe(before);
  }

  describe('create', () => {
    let world: TallyChapter;

    beforeAll(async () => {
      world = await aTallyChapter(testApp, '2025-01-01');
      const chapterId = world.chapter.id;
      // Two parcels in March and one in April: only March's count towards March's tally.
      await createReceipt(
        testApp,
        world.lead.token,
        receiptInput(chapterId, {
          receivedOn: '2025-03-04',
          panelsAccepted: 24,
          setAside: { offSize: 1, hardCareYarn: 0, soiledOrDamaged: 2, other: 0 },
        }),
      );
      await createReceipt(
        testApp,
        world.lead.token,
        receiptInput(chapterId, {
          receivedOn: '2025-03-31',
          panelsAccepted: 30,
          setAside: { offSize: 0, hardCareYarn: 3, soiledOrDamaged: 0, other: 1 },
          setAsideOtherNote: 'Felted in the wash',
          finishedBlankets: [{ blanketSizeId: world.size.id, count: 2 }],
        }),
      );
      await createReceipt(
        testApp,
        world.lead.token,
        receiptInput(chapterId, { receivedOn: '2025-04-01', panelsAccepted: 500 }),
      );
    });

    it("prefills a chapter's first tally from the month's receipts and the opening typed in", async () => {
      const created = await createTally(testApp, world.lead.token, {
        chapterId: world.chapter.id,
        month: '2025-03',
        opening: { panels: 40, blankets: 3 },
      });
      expect(created).toMatchObject({
        chapterId: world.chapter.id,
        chapterName: world.chapter.name,
        regionId: world.region.id,
        month: '2025-03',
        state: 'draft',
        revision: 1,
        approvedRevision: null,
        amendmentPending: false,
        openingEnteredByHand: true,
        version: 1,
        // Due on the chapter's due day (10) of the following month.
        dueOn: '2025-04-10',
        reporting: 'missing',
        allowedActions: ['edit', 'submit'],
        headline: { panelsAccepted: 54, blanketsAssembled: 0, blanketsGiven: 0, peopleServed: 0 },
      });
      expect(created.values).toEqual({
        panels: {
          opening: 40,
          accepted: 54,
          setAside: { offSize: 1, hardCareYarn: 3, soiledOrDamaged: 2, other: 1 },
          usedInAssembly: 0,
          closing: 94,
        },
        receiptsDifferenceReason: null,
        blankets: { opening: 3, assembled: [], received: 2, given: [], closing: 5 },
        peopleServed: [],
        volunteerHours: 0,
        yarnDonated: null,
        notes: null,
      });
      expect(created.checkContext).toMatchObject({
        month: '2025-03',
        receipts: {
          count: 2,
          panelsAccepted: 54,
          setAside: { offSize: 1, hardCareYarn: 3, soiledOrDamaged: 2, other: 1 },
          finishedBlankets: 2,
        },
        expectedOpening: null,
        history: [],
      });
      expect(created.checkContext.blanketSizes).toContainEqual({
        id: world.size.id,
        name: world.size.name,
        panels: 20,
      });
      expect(created.checks.errors).toEqual([]);
      expect(created.checks.infos.map((p) => p.code)).toContain('opening-by-hand');
      expect(created.agencies).toEqual([
        { id: world.agency.id, name: world.agency.name, kind: world.agency.kind },
      ]);
      expect(created.revisions).toEqual([
        expect.objectContaining({ revision: 1, state: 'draft', amendmentReason: null }),
      ]);
      expect(created.events).toEqual([
        expect.objectContaining({ kind: 'created', revision: 1, comment: null }),
      ]);
      expect((await storedTally(testApp.app, created.id)).audit).toEqual(['tally.created']);
    });

    it("carries last month's closing stock, flagged when last month is not approved yet", async () => {
      const april = await createTally(testApp, world.lead.token, {
        chapterId: world.chapter.id,
        month: '2025-04',
      });
      expect(april.openingEnteredByHand).toBe(false);
      expect(april.values.panels).toMatchObject({ opening: 94, accepted: 500, closing: 594 });
      expect(april.values.blankets).toMatchObject({ opening: 5, received: 0, closing: 5 });
      expect(april.checkContext.expectedOpening).toEqual({
        panels: 94,
        blankets: 5,
        fromMonth: '2025-03',
        approved: false,
      });
      expect(april.checks.warnings.map((p) => p.code)).toContain('opening-not-approved');
    });

    it('refuses an opening typed in when it is carried from last month (400 naming opening)', async () => {
      await refusedCreate(
        world.lead.token,
        { chapterId: world.chapter.id, month: '2025-05', opening: { panels: 1, blankets: 0 } },
        400,
        'opening',
        /opening/,
      );
    });

    it('refuses a second tally for the same chapter-month (409 saying which exists)', async () => {
      const existing = await tallies.findOne({
        where: { chapterId: world.chapter.id, month: '2025-03-01' },
      });
      const response = await as(world.lead.token).post('/api/tallies', {
        chapterId: world.chapter.id,
        month: '2025-03',
      });
      expect(response.status).toBe(409);
      const error = response.body as ApiErrorBody;
      expect(fieldsNamed(error)).toEqual(['month']);
      expect(error.message).toContain(`tally ${existing!.id}`);
      expect(error.message).toContain('Mar 2025');
      expect(
        await tallies.count({ where: { chapterId: world.chapter.id, month: '2025-03-01' } }),
      ).toBe(1);
    });

    it('refuses a gap: a month whose previous month has no tally (409 "file … first")', async () => {
      await refusedCreate(
        world.lead.token,
        { chapterId: world.chapter.id, month: '2025-07' },
        409,
        'month',
        /File the tally for Jun 2025 first/,
      );
    });

    it('refuses a month before the chapter existed (400 naming month)', async () => {
      await refusedCreate(
        world.lead.token,
        { chapterId: world.chapter.id, month: '2024-12' },
        400,
        'month',
        /before .* started \(Jan 2025\)/,
      );
    });

    it('refuses a future month (400 naming month)', async () => {
      // Two months ahead: next month has already begun in the earliest time zones on its eve.
      await refusedCreate(
        world.lead.token,
        { chapterId: world.chapter.id, month: monthFromNow(2) },
        400,
        'month',
        /in the future/,
      );
    });

    it('refuses a month after the chapter closed (400 naming month)', async () => {
      const closed = await aTallyChapter(testApp, '2024-01-01');
      await closed.chapter.update({ activeTo: '2024-06-30' });
      await refusedCreate(
        staff,
        { chapterId: closed.chapter.id, month: '2024-07' },
        400,
        'month',
        /after .* closed \(Jun 2024\)/,
      );
    });

    it.each([
      ['a month that is not YYYY-MM', { month: '2025-3' }, 'month'],
      ['month 13', { month: '2025-13' }, 'month'],
      [
        'a negative opening count',
        { month: '2025-01', opening: { panels: -1, blankets: 0 } },
        'opening.panels',
      ],
      [
        'a fractional opening count',
        { month: '2025-01', opening: { panels: 0, blankets: 1.5 } },
        'opening.blankets',
      ],
      ['a chapter id as text', { chapterId: 'one', month: '2025-01' }, 'chapterId'],
    ])('refuses %s (400 naming the field)', async (_what, override, field) => {
      const fresh = await aTallyChapter(testApp, '2025-01-01');
      const body: Record<string, unknown> = { chapterId: fresh.chapter.id, month: '2025-01' };
      Object.assign(body, override);
      const response = await as(fresh.lead.token).post('/api/tallies', body);
      expect(response.status).toBe(400);
      expect(fieldsNamed(response.body)).toEqual([field]);
      expect(await countFor(fresh.chapter.id)).toBe(0);
    });

    it('allows the current month and answers 400 for a chapter that does not exist', async () => {
      const fresh = await aTallyChapter(testApp, '2024-01-01');
      const current = await createTally(testApp, fresh.lead.token, {
        chapterId: fresh.chapter.id,
        month: monthFromNow(0),
      });
      expect(current.reporting).toBe('upcoming');
      const response = await as(staff).post('/api/tallies', {
        chapterId: 999_999_999,
        month: '2025-01',
      });
      expect(response.status).toBe(400);
      expect(fieldsNamed(response.body)).toEqual(['chapterId']);
    });
  });

  describe('scope', () => {
    let home: TallyChapter;
    let away: TallyChapter;
    let homeTally: TallyDetail;
    let awayTally: TallyDetail;

    beforeAll(async () => {
      home = await aTallyChapter(testApp, '2025-01-01');
      away = await aTallyChapter(testApp, '2025-01-01');
      homeTally = await createTally(testApp, home.lead.token, {
        chapterId: home.chapter.id,
        month: '2025-01',
      });
      awayTally = await createTally(testApp, away.lead.token, {
        chapterId: away.chapter.id,
        month: '2025-01',
      });
    });

    it('gives a lead of another chapter 404 for the tally, its revisions and every write', async () => {
      const other = as(away.lead.token);
      const id = homeTally.id;
      expect((await other.get(`/api/tallies/${id}`)).status).toBe(404);
      expect((await other.get(`/api/tallies/${id}/revisions/1`)).status).toBe(404);
      const put = await other.put(`/api/tallies/${id}`, { version: 1, values: homeTally.values });
      expect(put.status).toBe(404);
      const submit = await other.post(`/api/tallies/${id}/submit`, {
        version: 1,
        acknowledgedWarnings: [],
      });
      expect(submit.status).toBe(404);
      expect(await storedTally(testApp.app, id)).toMatchObject({ state: 'draft', version: 1 });
    });

    it('gives a coordinator of another region 404, and their own region 200', async () => {
      expect((await as(away.coordinator.token).get(`/api/tallies/${homeTally.id}`)).status).toBe(
        404,
      );
      const returned = await as(away.coordinator.token).post(
        `/api/tallies/${homeTally.id}/return`,
        {
          version: 1,
          comment: 'Not mine to return',
        },
      );
      expect(returned.status).toBe(404);
      const own = await as(home.coordinator.token).get(`/api/tallies/${homeTally.id}`);
      expect(own.status).toBe(200);
      // A coordinator reviews; editing and submitting are the chapter's.
      expect((own.body as TallyDetail).allowedActions).toEqual([]);
    });

    it("refuses to start a tally for a chapter outside the person's scope (404)", async () => {
      const response = await as(home.lead.token).post('/api/tallies', {
        chapterId: away.chapter.id,
        month: '2025-02',
      });
      expect(response.status).toBe(404);
      expect(await countFor(away.chapter.id)).toBe(1);
    });

    it("lists only the tallies in the person's scope", async () => {
      const mine = (await as(home.lead.token).get('/api/tallies?pageSize=100').expect(200))
        .body as TallyPage;
      expect(mine.items.map((item) => item.chapterId)).toEqual(
        mine.items.map(() => home.chapter.id),
      );
      expect(mine.items.map((item) => item.id)).toContain(homeTally.id);
      const region = (await as(away.coordinator.token).get('/api/tallies?pageSize=100').expect(200))
        .body as TallyPage;
      expect(region.items.map((item) => item.id)).toEqual([awayTally.id]);
    });

    it('refuses a grant writer any tally (403)', async () => {
      const writer = (await signedIn(testApp, 'grant_writer')).token;
      expect((await as(writer).get('/api/tallies')).status).toBe(403);
      expect((await as(writer).get(`/api/tallies/${homeTally.id}`)).status).toBe(403);
    });
  });

  describe('list', () => {
    let world: TallyChapter;
    let jan: TallyDetail;
    let feb: TallyDetail;
    let mar: TallyDetail;

    beforeAll(async () => {
      world = await aTallyChapter(testApp, '2025-01-01');
      const lines = { sizeId: world.size.id, agencyId: world.agency.id };
      jan = await createTally(testApp, world.lead.token, {
        chapterId: world.chapter.id,
        month: '2025-01',
        opening: { panels: 100, blankets: 0 },
      });
      jan = await approvedTally(testApp, jan, consistentValues(jan.values, lines), {
        writer: world.lead.token,
        reviewer: world.coordinator.token,
      });
      feb = await createTally(testApp, world.lead.token, {
        chapterId: world.chapter.id,
        month: '2025-02',
      });
      const saved = await as(world.lead.token).put(`/api/tallies/${feb.id}`, {
        version: feb.version,
        values: consistentValues(feb.values, lines),
      });
      feb = saved.body as TallyDetail;
      feb = (
        await as(world.lead.token).post(`/api/tallies/${feb.id}/submit`, {
          version: feb.version,
          acknowledgedWarnings: [],
        })
      ).body as TallyDetail;
      mar = await createTally(testApp, world.lead.token, {
        chapterId: world.chapter.id,
        month: '2025-03',
      });
    });

    const list = async (query: string) =>
      (await as(world.coordinator.token).get(`/api/tallies?${query}`).expect(200))
        .body as TallyPage;

    it('filters by state, month and range, newest month first', async () => {
      const chapter = `chapterId=${world.chapter.id}`;
      expect((await list(chapter)).items.map((t) => t.month)).toEqual([
        '2025-03',
        '2025-02',
        '2025-01',
      ]);
      expect((await list(`${chapter}&state=submitted`)).items.map((t) => t.id)).toEqual([feb.id]);
      expect((await list(`${chapter}&month=2025-01`)).items.map((t) => t.id)).toEqual([jan.id]);
      expect(
        (await list(`${chapter}&from=2025-02&to=2025-03&direction=asc`)).items.map((t) => t.id),
      ).toEqual([feb.id, mar.id]);
      expect(
        (await list(`regionId=${world.region.id}&sort=state&direction=asc`)).items.map(
          (t) => t.state,
        ),
      ).toEqual(['draft', 'submitted', 'approved']);
    });

    it('summarises each tally: headline, approval, reporting', async () => {
      const [item] = (await list(`chapterId=${world.chapter.id}&month=2025-01`)).items;
      expect(item).toMatchObject({
        id: jan.id,
        state: 'approved',
        revision: 1,
        approvedRevision: 1,
        amendmentPending: false,
        approvedByName: world.coordinator.user.displayName,
        headline: {
          panelsAccepted: 0,
          blanketsAssembled: 1,
          blanketsGiven: 1,
          peopleServed: 1,
          volunteerHours: 6.5,
        },
        dueOn: '2025-02-10',
        // Submitted today, long after the due date.
        reporting: 'late',
      });
      expect(item.approvedAt).not.toBeNull();
      expect(item.submittedAt).not.toBeNull();
    });

    it('pages, and sorts by submission time', async () => {
      const first = await list(`chapterId=${world.chapter.id}&pageSize=2&page=1`);
      const second = await list(`chapterId=${world.chapter.id}&pageSize=2&page=2`);
      expect(first.total).toBe(3);
      expect([...first.items, ...second.items].map((t) => t.id)).toEqual([mar.id, feb.id, jan.id]);
      const bySubmission = await list(
        `chapterId=${world.chapter.id}&sort=submittedAt&direction=desc`,
      );
      expect(bySubmission.items.map((t) => t.id)).toEqual([feb.id, jan.id, mar.id]);
    });

    it.each([
      ['pageSize=101', 'pageSize'],
      ['page=0', 'page'],
      ['state=lost', 'state'],
      ['month=2025-1', 'month'],
      ['sort=colour', 'sort'],
      ['chapterId=abc', 'chapterId'],
    ])('refuses %s (400 naming it)', async (query, field) => {
      const response = await as(staff).get(`/api/tallies?${query}`);
      expect(response.status).toBe(400);
      expect(fieldsNamed(response.body)).toEqual([field]);
    });
  });

  describe('revisions and the calendar', () => {
    it('reads a revision by number, and 404 for one that does not exist', async () => {
      const world = await aTallyChapter(testApp, '2025-01-01');
      const tally = await createTally(testApp, world.lead.token, {
        chapterId: world.chapter.id,
        month: '2025-01',
      });
      const revision = (await as(admin).get(`/api/tallies/${tally.id}/revisions/1`).expect(200))
        .body as TallyRevisionView;
      expect(revision).toMatchObject({
        revision: 1,
        state: 'draft',
        values: tally.values,
        acknowledgedWarnings: [],
      });
      const missing = await as(admin).get(`/api/tallies/${tally.id}/revisions/2`);
      expect(missing.status).toBe(404);
      expect((missing.body as ApiErrorBody).message).toContain('no revision 2');
      expect((await as(admin).get(`/api/tallies/${tally.id}/revisions/two`)).status).toBe(400);
    });

    it("lists a chapter's months from when it started to now, newest first, with how each stands", async () => {
      const started = monthFromNow(-3);
      const world = await aTallyChapter(testApp, `${started}-01`, 28);
      const lines = { sizeId: world.size.id, agencyId: world.agency.id };
      let first = await createTally(testApp, world.lead.token, {
        chapterId: world.chapter.id,
        month: started,
        opening: { panels: 50, blankets: 0 },
      });
      first = await approvedTally(testApp, first, consistentValues(first.values, lines), {
        writer: world.lead.token,
        reviewer: world.coordinator.token,
      });
      let second = await createTally(testApp, world.lead.token, {
        chapterId: world.chapter.id,
        month: monthFromNow(-2),
      });
      second = (
        await as(world.lead.token).put(`/api/tallies/${second.id}`, {
          version: second.version,
          values: consistentValues(second.values, lines),
        })
      ).body as TallyDetail;
      second = (
        await as(world.lead.token).post(`/api/tallies/${second.id}/submit`, {
          version: second.version,
          acknowledgedWarnings: [],
        })
      ).body as TallyDetail;
      await as(world.coordinator.token)
        .post(`/api/tallies/${second.id}/return`, {
          version: second.version,
          comment: 'Count the hats separately.',
        })
        .expect(200);

      const calendar = (
        await as(world.lead.token)
          .get(`/api/tallies/calendar?chapterId=${world.chapter.id}`)
          .expect(200)
      ).body as TallyCalendar;
      const today = new Date().toISOString().slice(0, 10);
      expect(calendar.today).toBe(today);
      const lastMonthDue = `${monthFromNow(0)}-28`;
      expect(
        calendar.entries.map(({ month, reporting, state, tallyId, returnComment }) => ({
          month,
          reporting,
          state,
          tallyId,
          returnComment,
        })),
      ).toEqual([
        {
          month: monthFromNow(0),
          reporting: 'upcoming',
          state: null,
          tallyId: null,
          returnComment: null,
        },
        {
          month: monthFromNow(-1),
          reporting: today <= lastMonthDue ? 'due' : 'missing',
          state: null,
          tallyId: null,
          returnComment: null,
        },
        // Submitted today: after the 28th of last month, so late.
        {
          month: monthFromNow(-2),
          reporting: 'late',
          state: 'returned',
          tallyId: second.id,
          returnComment: 'Count the hats separately.',
        },
        {
          month: started,
          reporting: 'late',
          state: 'approved',
          tallyId: first.id,
          returnComment: null,
        },
      ]);
      expect(calendar.entries.every((entry) => entry.chapterId === world.chapter.id)).toBe(true);
    });

    it("shows a lead only their own chapter's months, and 404 for another chapter", async () => {
      const mine = await aTallyChapter(testApp, `${monthFromNow(-1)}-01`);
      const theirs = await aTallyChapter(testApp, '2025-01-01');
      const calendar = (await as(mine.lead.token).get('/api/tallies/calendar').expect(200))
        .body as TallyCalendar;
      expect(calendar.entries.map((entry) => [entry.chapterId, entry.month])).toEqual([
        [mine.chapter.id, monthFromNow(0)],
        [mine.chapter.id, monthFromNow(-1)],
      ]);
      expect(
        (await as(mine.lead.token).get(`/api/tallies/calendar?chapterId=${theirs.chapter.id}`))
          .status,
      ).toBe(404);
      expect((await as(mine.lead.token).get('/api/tallies/calendar?chapterId=x')).status).toBe(400);
    });
  });
});
