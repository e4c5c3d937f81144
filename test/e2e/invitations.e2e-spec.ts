import { getModelToken } from '@nestjs/sequelize';
import type {
  ApiErrorBody,
  OneTimeLinkInfo,
  OutboxMessage,
  SessionResponse,
  UserView,
} from '@tallyloom/core';
import { createHash } from 'node:crypto';
import { AuditEntry } from '../../services/api/src/audit/models/audit-entry.model';
import { OneTimeLink } from '../../services/api/src/auth/models/one-time-link.model';
import { User } from '../../services/api/src/users/models/user.model';
import { aRegion } from './support/network-builders';
import { aUser, signIn, signedIn } from './support/people-builders';
import { startTestApp, uniqueSuffix, type TestApp } from './support/test-app';

// Accepting, resetting and signing in each cost a bcrypt hash or two.
jest.setTimeout(30_000);

const LINK_GONE = /no longer valid/;

describe('invitations and password resets, through the e-mailed links', () => {
  let testApp: TestApp;
  let users: typeof User;
  let links: typeof OneTimeLink;
  let audit: typeof AuditEntry;
  let admin: string;
  let chapterId: number;

  beforeAll(async () => {
    testApp = await startTestApp();
    users = testApp.app.get<typeof User>(getModelToken(User));
    links = testApp.app.get<typeof OneTimeLink>(getModelToken(OneTimeLink));
    audit = testApp.app.get<typeof AuditEntry>(getModelToken(AuditEntry));
    admin = `Bearer ${(await signedIn(testApp, 'network_admin')).token}`;
    chapterId = (await aRegion().withChapter('Invite Mill').build(testApp.app)).chapters[0].id;
  });
  afterAll(() => testApp.close());

  const newEmail = (who: string) => `${who}.${uniqueSuffix().toLowerCase()}@test.example`;

  async function outboxTo(email: string): Promise<OutboxMessage[]> {
    const response = await testApp.http().get('/api/dev/outbox').set('Authorization', admin);
    expect(response.status).toBe(200);
    return (response.body as OutboxMessage[]).filter((message) => message.to.includes(email));
  }

  /** The token of the newest mail to `email` whose link goes to `page`. */
  async function tokenMailedTo(email: string, page: string): Promise<string> {
    const [latest] = await outboxTo(email);
    expect(latest).toBeDefined();
    const link = latest.links.find((l) => l.includes(`/${page}?token=`));
    expect(link).toBeDefined();
    const token = new URL(link!).searchParams.get('token');
    expect(token).toMatch(/^[A-Za-z0-9_-]{40,}$/);
    return token!;
  }

  async function invite(email: string): Promise<UserView> {
    const response = await testApp
      .http()
      .post('/api/users')
      .set('Authorization', admin)
      .send({ email, displayName: 'Wren Calloway', role: 'chapter_lead', chapterId });
    expect(response.status).toBe(201);
    return response.body as UserView;
  }

  const linkInfo = (token: string) => testApp.http().get(`/api/auth/links/${token}`);
  const accept = (token: string, password: string) =>
    testApp.http().post('/api/auth/invitations/accept').send({ token, password });

  describe('invitations', () => {
    it('invites a chapter lead, mails a single-use link, and the accepted person can sign in', async () => {
      const email = newEmail('invitee');
      const invited = await invite(email);
      expect(invited).toMatchObject({
        email,
        displayName: 'Wren Calloway',
        role: 'chapter_lead',
        chapterId,
        status: 'invited',
        lastSignInAt: null,
      });

      const [mail] = await outboxTo(email);
      expect(mail.subject).toBe('You are invited to Tallyloom');
      const token = await tokenMailedTo(email, 'accept-invitation');

      const info = await linkInfo(token).expect(200);
      expect(info.body as OneTimeLinkInfo).toMatchObject({
        purpose: 'invitation',
        email,
        displayName: 'Wren Calloway',
      });
      const expiresAt = new Date((info.body as OneTimeLinkInfo).expiresAt).getTime();
      // INVITATION_DAYS defaults to 7.
      expect(expiresAt).toBeGreaterThan(Date.now() + 6.9 * 86_400_000);
      expect(expiresAt).toBeLessThan(Date.now() + 7.1 * 86_400_000);

      const common = await accept(token, 'password123');
      expect(common.status).toBe(400);
      expect((common.body as ApiErrorBody).fields).toEqual([
        {
          field: 'password',
          messages: ['This password is on a list of commonly used passwords; choose another.'],
        },
      ]);
      expect((await users.findByPk(invited.id))?.passwordHash).toBeNull();
      await linkInfo(token).expect(200);

      const password = 'slip stitch over the moor';
      const accepted = await accept(token, password);
      expect(accepted.status).toBe(200);
      const session = accepted.body as SessionResponse;
      expect(session.user).toMatchObject({ id: invited.id, email, role: 'chapter_lead' });
      expect(String(accepted.headers['set-cookie'])).toMatch(/tl_refresh=/);

      const again = await accept(token, 'another fine passphrase');
      expect(again.status).toBe(404);
      expect((again.body as ApiErrorBody).message).toMatch(LINK_GONE);
      const info2 = await linkInfo(token);
      expect(info2.status).toBe(404);

      await signIn(testApp, email, password);
      const person = await testApp
        .http()
        .get(`/api/users/${invited.id}`)
        .set('Authorization', admin)
        .expect(200);
      expect((person.body as UserView).status).toBe('active');
    });

    it('resending makes the earlier link invalid; an accepted person cannot be re-invited (409)', async () => {
      const email = newEmail('resend');
      const invited = await invite(email);
      const first = await tokenMailedTo(email, 'accept-invitation');

      const resend = () =>
        testApp.http().post(`/api/users/${invited.id}/resend-invite`).set('Authorization', admin);
      await resend().expect(204);
      expect(await outboxTo(email)).toHaveLength(2);
      const second = await tokenMailedTo(email, 'accept-invitation');
      expect(second).not.toBe(first);

      const old = await linkInfo(first);
      expect(old.status).toBe(404);
      expect((old.body as ApiErrorBody).message).toMatch(LINK_GONE);
      expect((await accept(first, 'slip stitch over the moor')).status).toBe(404);
      await linkInfo(second).expect(200);
      await accept(second, 'slip stitch over the moor').expect(200);

      const late = await resend();
      expect(late.status).toBe(409);
      expect((late.body as ApiErrorBody).message).toBe(
        'This person has already accepted the invitation.',
      );
      expect(await outboxTo(email)).toHaveLength(2);
    });

    it('refuses an expired link (404) and leaves the person invited', async () => {
      const email = newEmail('expired');
      const invited = await invite(email);
      const token = await tokenMailedTo(email, 'accept-invitation');
      await linkInfo(token).expect(200);

      await links.update(
        { expiresAt: new Date(Date.now() - 60_000) },
        { where: { userId: invited.id } },
      );

      const info = await linkInfo(token);
      expect(info.status).toBe(404);
      expect((info.body as ApiErrorBody).message).toMatch(LINK_GONE);
      expect((await accept(token, 'slip stitch over the moor')).status).toBe(404);
      expect((await users.findByPk(invited.id))?.passwordHash).toBeNull();
    });

    it('stores only the hash of the link token', async () => {
      const email = newEmail('hashonly');
      const invited = await invite(email);
      const token = await tokenMailedTo(email, 'accept-invitation');

      const ours = await links.findAll({ where: { userId: invited.id } });
      expect(ours).toHaveLength(1);
      expect(ours[0].tokenHash).toBe(createHash('sha256').update(token, 'utf8').digest('hex'));
      const everyRow = await links.findAll({ raw: true });
      const holdingToken = everyRow.filter((row) => JSON.stringify(row).includes(token));
      expect(holdingToken).toEqual([]);
    });
  });

  describe('password reset', () => {
    const requestReset = (email: string) =>
      testApp.http().post('/api/auth/password-reset').send({ email });
    const completeReset = (token: string, password: string) =>
      testApp.http().post('/api/auth/password-reset/complete').send({ token, password });

    it('answers 202 for an unknown address and mails nothing', async () => {
      const email = newEmail('unknown');
      const response = await requestReset(email);
      expect(response.status).toBe(202);
      expect(await outboxTo(email)).toEqual([]);
      // The request is recorded, about no one; no account or link appears for the address.
      const recorded = await audit.findAll({
        where: { action: 'auth.password_reset_requested', actorEmail: email },
      });
      expect(recorded.map((entry) => entry.entityId)).toEqual([null]);
      expect(await users.count({ where: { email } })).toBe(0);
    });

    it('mails a single-use reset link; the new password replaces the old one', async () => {
      const person = await aUser().withRole('auditor').build(testApp.app);
      const { refreshCookie } = await signIn(testApp, person.email, person.password);

      await requestReset(person.email).expect(202);
      const [mail] = await outboxTo(person.email);
      expect(mail.subject).toBe('Reset your Tallyloom password');
      const token = await tokenMailedTo(person.email, 'reset-password');
      const info = await linkInfo(token).expect(200);
      expect((info.body as OneTimeLinkInfo).purpose).toBe('password_reset');

      const password = 'bind off by lamplight';
      await completeReset(token, password).expect(204);

      const old = await testApp
        .http()
        .post('/api/auth/sign-in')
        .send({ email: person.email, password: person.password });
      expect(old.status).toBe(401);
      await signIn(testApp, person.email, password);

      const twice = await completeReset(token, 'another fine passphrase');
      expect(twice.status).toBe(404);
      expect((twice.body as ApiErrorBody).message).toMatch(LINK_GONE);
      await signIn(testApp, person.email, password);
      // A reset ends every earlier session.
      const earlier = await testApp.http().post('/api/auth/refresh').set('Cookie', refreshCookie);
      expect(earlier.status).toBe(401);
    });

    it('clears a lock-out', async () => {
      const person = await aUser().withRole('national_staff').build(testApp.app);
      const statuses: number[] = [];
      for (let i = 1; i <= 5; i += 1) {
        const response = await testApp
          .http()
          .post('/api/auth/sign-in')
          .send({ email: person.email, password: `wrong-guess-${i}` });
        statuses.push(response.status);
      }
      expect(statuses).toEqual([401, 401, 401, 401, 423]);
      expect((await users.findByPk(person.user.id))?.lockedUntil).toBeInstanceOf(Date);

      await requestReset(person.email).expect(202);
      const token = await tokenMailedTo(person.email, 'reset-password');
      const password = 'cable knit in the dark';
      await completeReset(token, password).expect(204);

      const stored = await users.findByPk(person.user.id);
      expect(stored?.lockedUntil).toBeNull();
      expect(stored?.failedAttempts).toBe(0);
      await signIn(testApp, person.email, password);
    });
  });
});
