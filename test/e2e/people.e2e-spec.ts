import { getModelToken } from '@nestjs/sequelize';
import type { ApiErrorBody, ChapterView, Page, UserView } from '@tallyloom/core';
import { User } from '../../services/api/src/users/models/user.model';
import { aRegion } from './support/network-builders';
import { aUser, signIn, signedIn, type BuiltUser } from './support/people-builders';
import { startTestApp, uniqueSuffix, type TestApp } from './support/test-app';

jest.setTimeout(30_000);

const NOT_YOURSELF =
  'You cannot deactivate yourself or change your own role; ask another network admin.';

describe('people: the admin list, invitations and changes', () => {
  let testApp: TestApp;
  let users: typeof User;
  let admin: BuiltUser & { token: string };
  let auth: string;
  let home: Awaited<ReturnType<ReturnType<typeof aRegion>['build']>>;

  beforeAll(async () => {
    testApp = await startTestApp();
    users = testApp.app.get<typeof User>(getModelToken(User));
    admin = await signedIn(testApp, 'network_admin');
    auth = `Bearer ${admin.token}`;
    home = await aRegion()
      .named('People Home')
      .withChapter('Warp Yard')
      .withChapter('Weft Yard')
      .build(testApp.app);
  });
  afterAll(() => testApp.close());

  const term = () => uniqueSuffix().toLowerCase();
  const list = (query: string) =>
    testApp.http().get(`/api/users?${query}`).set('Authorization', auth);
  const invite = (body: object) =>
    testApp.http().post('/api/users').set('Authorization', auth).send(body);
  const patch = (id: number | string, body: object) =>
    testApp.http().patch(`/api/users/${id}`).set('Authorization', auth).send(body);

  describe('list', () => {
    it('pages through the matches: 3 found, 2 on page 1, 1 on page 2', async () => {
      const shared = term();
      const built: BuiltUser[] = [];
      for (const name of ['ash', 'birch', 'cedar']) {
        built.push(await aUser().withEmail(`${name}.${shared}@test.example`).build(testApp.app));
      }

      const first = (await list(`search=${shared}&pageSize=2`).expect(200)).body as Page<UserView>;
      expect(first).toMatchObject({ total: 3, page: 1, pageSize: 2 });
      expect(first.items).toHaveLength(2);
      const second = (await list(`search=${shared}&pageSize=2&page=2`).expect(200))
        .body as Page<UserView>;
      expect(second).toMatchObject({ total: 3, page: 2, pageSize: 2 });
      expect(second.items).toHaveLength(1);

      const seen = [...first.items, ...second.items].map((u) => u.id).sort((a, b) => a - b);
      expect(seen).toEqual(built.map((b) => b.user.id).sort((a, b) => a - b));
    });

    it('finds people by a fragment of their e-mail', async () => {
      const shared = term();
      const wanted = await aUser()
        .withEmail(`fern.gully.${shared}@test.example`)
        .build(testApp.app);
      await aUser().withEmail(`moss.bank.${shared}@test.example`).build(testApp.app);

      const page = (await list(`search=gully.${shared}`).expect(200)).body as Page<UserView>;
      expect(page.total).toBe(1);
      expect(page.items.map((u) => u.email)).toEqual([wanted.email]);
    });

    it('filters by role and by status', async () => {
      const shared = term();
      const invited = await aUser()
        .withRole('chapter_lead')
        .inChapter(home.chapters[0].id)
        .withEmail(`invited.${shared}@test.example`)
        .invited()
        .build(testApp.app);
      const gone = await aUser()
        .withRole('auditor')
        .withEmail(`gone.${shared}@test.example`)
        .deactivated()
        .build(testApp.app);
      const working = await aUser()
        .withRole('national_staff')
        .withEmail(`working.${shared}@test.example`)
        .build(testApp.app);
      const ids = async (query: string) =>
        ((await list(`search=${shared}&${query}`).expect(200)).body as Page<UserView>).items.map(
          (u) => u.id,
        );

      expect(await ids('status=invited')).toEqual([invited.user.id]);
      expect(await ids('status=deactivated')).toEqual([gone.user.id]);
      expect(await ids('status=active')).toEqual([working.user.id]);
      expect(await ids('role=auditor')).toEqual([gone.user.id]);
      expect(await ids('role=chapter_lead&status=invited')).toEqual([invited.user.id]);
      expect(await ids('role=chapter_lead&status=active')).toEqual([]);
    });

    it('refuses an unknown status filter with 400 naming it', async () => {
      const response = await list('status=asleep');
      expect(response.status).toBe(400);
      expect((response.body as ApiErrorBody).fields?.map((f) => f.field)).toEqual(['status']);
    });
  });

  describe('invite validation', () => {
    it('needs a chapter for a chapter lead (400 chapterId), and stores no one', async () => {
      const email = `nochapter.${term()}@test.example`;
      const response = await invite({ email, displayName: 'Ada Brook', role: 'chapter_lead' });
      expect(response.status).toBe(400);
      expect((response.body as ApiErrorBody).fields).toEqual([
        { field: 'chapterId', messages: ['A chapter lead needs a chapter.'] },
      ]);
      expect(await users.count({ where: { email } })).toBe(0);
    });

    it('needs an existing region for a regional coordinator (400 regionId)', async () => {
      const email = `noregion.${term()}@test.example`;
      const response = await invite({
        email,
        displayName: 'Ada Brook',
        role: 'regional_coordinator',
        regionId: 999999999,
      });
      expect(response.status).toBe(400);
      expect((response.body as ApiErrorBody).fields).toEqual([
        { field: 'regionId', messages: ['No such region.'] },
      ]);
      expect(await users.count({ where: { email } })).toBe(0);
    });

    it('refuses an e-mail already in use (409 email), whatever its case', async () => {
      const existing = await aUser().build(testApp.app);
      const response = await invite({
        email: existing.email.toUpperCase(),
        displayName: 'Second Copy',
        role: 'grant_writer',
      });
      expect(response.status).toBe(409);
      const error = response.body as ApiErrorBody;
      expect(error.message).toBe('Someone with this e-mail address is already in Tallyloom.');
      expect(error.fields).toEqual([
        { field: 'email', messages: ['This e-mail address is already in use.'] },
      ]);
      const rows = await users.findAll({ where: { email: existing.email } });
      expect(rows.map((u) => u.displayName)).toEqual([existing.user.displayName]);
    });

    it('answers 409, never 500, when the same address is invited twice at once', async () => {
      // A double-clicked "Invite" button, or two admins at the same moment.
      const email = `twin.${term()}@test.example`;
      const body = { email, displayName: 'Twin Request', role: 'grant_writer' };
      const responses = await Promise.all([invite(body), invite(body), invite(body)]);

      expect(responses.map((r) => r.status).sort((a, b) => a - b)).toEqual([201, 409, 409]);
      for (const refused of responses.filter((r) => r.status !== 201)) {
        expect((refused.body as ApiErrorBody).fields?.map((f) => f.field)).toEqual(['email']);
      }
      expect(await users.count({ where: { email } })).toBe(1);
    });

    it('refuses an unknown role (400 role)', async () => {
      const email = `wizard.${term()}@test.example`;
      const response = await invite({ email, displayName: 'Ada Brook', role: 'wizard' });
      expect(response.status).toBe(400);
      const error = response.body as ApiErrorBody;
      expect(error.fields?.map((f) => f.field)).toEqual(['role']);
      expect(error.fields?.[0].messages[0]).toMatch(/^role must be one of: network_admin,/);
      expect(await users.count({ where: { email } })).toBe(0);
    });

    it('clears region and chapter for network roles even when sent', async () => {
      const email = `network.${term()}@test.example`;
      const response = await invite({
        email,
        displayName: 'Ada Brook',
        role: 'national_staff',
        regionId: home.region.id,
        chapterId: home.chapters[0].id,
      });
      expect(response.status).toBe(201);
      expect(response.body as UserView).toMatchObject({
        email,
        role: 'national_staff',
        regionId: null,
        chapterId: null,
        status: 'invited',
      });
      const stored = await users.findOne({ where: { email } });
      expect(stored).toMatchObject({ regionId: null, chapterId: null, passwordHash: null });
    });
  });

  describe('update', () => {
    it('moves a chapter lead to regional coordinator: their scope follows at once', async () => {
      const lead = await aUser()
        .withRole('chapter_lead')
        .inChapter(home.chapters[0].id)
        .build(testApp.app);
      const { token } = await signIn(testApp, lead.email, lead.password);
      const chapters = async () =>
        (
          (await testApp.http().get('/api/chapters').set('Authorization', `Bearer ${token}`))
            .body as ChapterView[]
        )
          .map((c) => c.id)
          .sort((a, b) => a - b);
      expect(await chapters()).toEqual([home.chapters[0].id]);

      const response = await patch(lead.user.id, {
        role: 'regional_coordinator',
        regionId: home.region.id,
      });
      expect(response.status).toBe(200);
      expect(response.body as UserView).toMatchObject({
        role: 'regional_coordinator',
        regionId: home.region.id,
        regionName: home.region.name,
        chapterId: null,
      });
      const stored = await users.findByPk(lead.user.id);
      expect(stored).toMatchObject({
        role: 'regional_coordinator',
        regionId: home.region.id,
        chapterId: null,
      });
      expect(await chapters()).toEqual(home.chapters.map((c) => c.id).sort((a, b) => a - b));
    });

    it('deactivates a person: their token stops at once and they cannot sign in; reactivates', async () => {
      const person = await aUser().withRole('grant_writer').build(testApp.app);
      const { token, refreshCookie } = await signIn(testApp, person.email, person.password);
      const me = () => testApp.http().get('/api/auth/me').set('Authorization', `Bearer ${token}`);
      await me().expect(200);

      const off = await patch(person.user.id, { active: false });
      expect(off.status).toBe(200);
      expect((off.body as UserView).status).toBe('deactivated');
      expect((await users.findByPk(person.user.id))?.active).toBe(false);
      expect((await me()).status).toBe(401);
      const refused = await testApp
        .http()
        .post('/api/auth/sign-in')
        .send({ email: person.email, password: person.password });
      expect(refused.status).toBe(403);
      expect((refused.body as ApiErrorBody).message).toMatch(/deactivated/);

      const on = await patch(person.user.id, { active: true });
      expect(on.status).toBe(200);
      expect((on.body as UserView).status).toBe('active');
      // The session from before the deactivation stays ended.
      await testApp.http().post('/api/auth/refresh').set('Cookie', refreshCookie).expect(401);
      await signIn(testApp, person.email, person.password);
    });

    it('does not let an admin deactivate themselves or change their own role (400)', async () => {
      for (const body of [{ active: false }, { role: 'auditor' }]) {
        const response = await patch(admin.user.id, body);
        expect(response.status).toBe(400);
        expect((response.body as ApiErrorBody).message).toBe(NOT_YOURSELF);
      }
      const stored = await users.findByPk(admin.user.id);
      expect(stored).toMatchObject({ active: true, role: 'network_admin' });
    });

    it('refuses a non-numeric id with 400 naming id', async () => {
      for (const response of [
        await testApp.http().get('/api/users/abc').set('Authorization', auth),
        await patch('abc', { displayName: 'Nobody' }),
      ]) {
        expect(response.status).toBe(400);
        expect((response.body as ApiErrorBody).fields).toEqual([
          { field: 'id', messages: ['id must be a whole number'] },
        ]);
      }
    });

    it('answers 404 for an unknown id', async () => {
      for (const response of [
        await testApp.http().get('/api/users/999999999').set('Authorization', auth),
        await patch(999999999, { displayName: 'Nobody' }),
      ]) {
        expect(response.status).toBe(404);
        expect((response.body as ApiErrorBody).message).toBe('No such person.');
      }
    });
  });

  describe('who may manage people', () => {
    it.each(['chapter_lead', 'auditor'] as const)('refuses the role %s (403)', async (role) => {
      const scope = role === 'chapter_lead' ? { chapterId: home.chapters[1].id } : {};
      const { token } = await signedIn(testApp, role, scope);
      const bearer = `Bearer ${token}`;

      const listed = await testApp.http().get('/api/users').set('Authorization', bearer);
      expect(listed.status).toBe(403);
      expect((listed.body as ApiErrorBody).message).toBe('Your role does not allow this.');

      const email = `sneaky.${term()}@test.example`;
      const invited = await testApp
        .http()
        .post('/api/users')
        .set('Authorization', bearer)
        .send({ email, displayName: 'Sneaky Guest', role: 'network_admin' });
      expect(invited.status).toBe(403);
      expect(await users.count({ where: { email } })).toBe(0);
    });
  });
});
