import { getModelToken } from '@nestjs/sequelize';
import type { ApiErrorBody, SessionResponse, SessionUser } from '@tallyloom/core';
import { dictionary } from '@zxcvbn-ts/language-common';
import { compare, getRounds } from 'bcryptjs';
import { sign } from 'jsonwebtoken';
import { createHash } from 'node:crypto';
import type { Response } from 'supertest';
import { AuditEntry } from '../../services/api/src/audit/models/audit-entry.model';
import { RefreshToken } from '../../services/api/src/auth/models/refresh-token.model';
import { BCRYPT_COST } from '../../services/api/src/auth/passwords/password-hasher';
import { User } from '../../services/api/src/users/models/user.model';
import { aRegion } from './support/network-builders';
import { aUser, signIn } from './support/people-builders';
import { startTestApp, uniqueSuffix, type TestApp } from './support/test-app';

// bcrypt as it is, but with its comparisons counted (see the unknown e-mail test). The API's
// own imports get this module too: a mock factory stands in for it across the whole suite.
jest.mock('bcryptjs', () => {
  const actual = jest.requireActual<typeof import('bcryptjs')>('bcryptjs');
  const counted = jest.fn((password: string, hash: string) => actual.compare(password, hash));
  return { ...actual, compare: counted };
});

// Every sign-in costs a bcrypt comparison; several tests make a dozen of them.
jest.setTimeout(30_000);

const WRONG_CREDENTIALS = 'E-mail or password is incorrect.';
const BAD_TOKEN = 'Sign in to continue: the access token is missing, invalid or expired.';
const DEACTIVATED = 'This account has been deactivated. Ask a network admin if you need it again.';

/** The `tl_refresh=…` pair of a response's Set-Cookie, as a browser would send it back. */
function refreshCookieOf(response: Response): string {
  return refreshSetCookieOf(response).split(';')[0];
}

function refreshSetCookieOf(response: Response): string {
  const cookies = ([] as string[]).concat(response.headers['set-cookie'] ?? []);
  const cookie = cookies.find((c) => c.startsWith('tl_refresh='));
  if (!cookie) throw new Error(`no tl_refresh cookie in ${JSON.stringify(cookies)}`);
  return cookie;
}

/** What the database holds for a refresh cookie: the SHA-256 of its secret, never the secret. */
function hashOfCookie(cookie: string): string {
  return createHash('sha256')
    .update(decodeURIComponent(cookie.slice('tl_refresh='.length)), 'utf8')
    .digest('hex');
}

function base64url(value: object): string {
  return Buffer.from(JSON.stringify(value)).toString('base64url');
}

describe('auth: sign-in, tokens, refresh and passwords', () => {
  let testApp: TestApp;
  let users: typeof User;
  let refreshTokens: typeof RefreshToken;
  let audit: typeof AuditEntry;

  beforeAll(async () => {
    testApp = await startTestApp();
    users = testApp.app.get<typeof User>(getModelToken(User));
    refreshTokens = testApp.app.get<typeof RefreshToken>(getModelToken(RefreshToken));
    audit = testApp.app.get<typeof AuditEntry>(getModelToken(AuditEntry));
  });
  afterAll(() => testApp.close());

  const postSignIn = (body: object) => testApp.http().post('/api/auth/sign-in').send(body);
  const me = (token: string) =>
    testApp.http().get('/api/auth/me').set('Authorization', `Bearer ${token}`);
  const refresh = (cookie: string) =>
    testApp.http().post('/api/auth/refresh').set('Cookie', cookie);

  describe('sign-in', () => {
    it('answers 200 with the session, sets a strict httpOnly refresh cookie, and the token works', async () => {
      const { region, chapters } = await aRegion().withChapter('Bobbin Lane').build(testApp.app);
      const person = await aUser()
        .withRole('chapter_lead')
        .inChapter(chapters[0].id)
        .build(testApp.app);

      const response = await postSignIn({ email: person.email, password: person.password });

      expect(response.status).toBe(200);
      const session = response.body as SessionResponse;
      expect(session.user).toMatchObject({
        id: person.user.id,
        email: person.email,
        role: 'chapter_lead',
        chapterId: chapters[0].id,
        chapterName: chapters[0].name,
        regionId: region.id,
      });
      expect(typeof session.accessToken).toBe('string');
      expect(new Date(session.accessTokenExpiresAt).getTime()).toBeGreaterThan(Date.now());

      const cookie = refreshSetCookieOf(response);
      expect(cookie).toMatch(/^tl_refresh=[A-Za-z0-9_-]{40,};/);
      expect(cookie).toMatch(/;\s*HttpOnly/i);
      expect(cookie).toMatch(/;\s*SameSite=Strict/i);
      expect(cookie).toMatch(/;\s*Path=\/api\/auth(;|$)/);

      const who = await me(session.accessToken).expect(200);
      expect(who.body as SessionUser).toMatchObject({
        id: person.user.id,
        role: 'chapter_lead',
        chapterId: chapters[0].id,
      });

      const stored = await users.findByPk(person.user.id);
      expect(stored?.lastSignInAt).toBeInstanceOf(Date);
      expect(
        await refreshTokens.count({
          where: { tokenHash: hashOfCookie(refreshCookieOf(response)) },
        }),
      ).toBe(1);
    });

    it("names the chapter lead's region as well as its id", async () => {
      const { region, chapters } = await aRegion()
        .named('Selvage')
        .withChapter('Purl Row')
        .build(testApp.app);
      const person = await aUser()
        .withRole('chapter_lead')
        .inChapter(chapters[0].id)
        .build(testApp.app);

      const { session } = await signIn(testApp, person.email, person.password);

      expect(session.user.regionId).toBe(region.id);
      expect(session.user.regionName).toBe(region.name);
    });

    it('answers a wrong password and an unknown e-mail alike, and spends a bcrypt comparison on both', async () => {
      const person = await aUser().build(testApp.app);
      const unknown = `nobody.${uniqueSuffix().toLowerCase()}@test.example`;
      const attempt = (email: string) => postSignIn({ email, password: 'not-the-password-at-all' });
      const wrong = await attempt(person.email);
      const missing = await attempt(unknown);
      expect(wrong.status).toBe(401);
      expect(missing.status).toBe(401);
      expect((wrong.body as ApiErrorBody).message).toBe(WRONG_CREDENTIALS);
      expect((missing.body as ApiErrorBody).message).toBe((wrong.body as ApiErrorBody).message);

      // The same work too, counted rather than timed: each answer spends one bcrypt comparison
      // against a hash of our cost. Without the decoy hash an unknown address would skip it and
      // answer about twenty times sooner, telling which addresses exist.
      const comparisons = jest.mocked(compare);
      for (const email of [unknown, person.email]) {
        comparisons.mockClear();
        expect((await attempt(email)).status).toBe(401);
        expect(comparisons).toHaveBeenCalledTimes(1);
        expect(getRounds(comparisons.mock.calls[0][1])).toBe(BCRYPT_COST);
      }
    });

    it('locks the account after 5 wrong passwords (423), then refuses even the right one', async () => {
      const person = await aUser().build(testApp.app);
      for (let i = 1; i <= 4; i += 1) {
        await postSignIn({ email: person.email, password: `wrong-guess-${i}` }).expect(401);
      }

      const fifth = await postSignIn({ email: person.email, password: 'wrong-guess-5' });
      expect(fifth.status).toBe(423);
      expect((fifth.body as ApiErrorBody).message).toMatch(/locked for 1[45] more minutes/);

      const right = await postSignIn({ email: person.email, password: person.password });
      expect(right.status).toBe(423);
      expect((right.body as ApiErrorBody).message).toMatch(/locked for \d+ more minutes?/);
      expect(right.headers['set-cookie']).toBeUndefined();

      const stored = await users.findByPk(person.user.id);
      expect(stored?.lockedUntil).toBeInstanceOf(Date);
      expect(stored!.lockedUntil!.getTime()).toBeGreaterThan(Date.now() + 10 * 60_000);
      expect(await refreshTokens.count({ where: { userId: person.user.id } })).toBe(0);
    });

    it('refuses a deactivated person: 403 with the right password, 401 with a wrong one', async () => {
      const person = await aUser().deactivated().build(testApp.app);

      const right = await postSignIn({ email: person.email, password: person.password });
      expect(right.status).toBe(403);
      expect((right.body as ApiErrorBody).message).toBe(DEACTIVATED);

      const wrong = await postSignIn({ email: person.email, password: 'not-their-password' });
      expect(wrong.status).toBe(401);
      expect((wrong.body as ApiErrorBody).message).toBe(WRONG_CREDENTIALS);
      expect(await refreshTokens.count({ where: { userId: person.user.id } })).toBe(0);
    });

    const tag = uniqueSuffix().toLowerCase();
    it.each([
      [
        'a number as e-mail',
        { email: 12345, password: 'whatever-it-is' },
        'email',
        'email must be text',
      ],
      [
        'an e-mail of 300 characters',
        { email: `${'a'.repeat(287)}@test.example`, password: 'whatever-it-is' },
        'email',
        'email must be at most 254 characters',
      ],
      [
        'a password of 5000 characters',
        { email: `long.password.${tag}@test.example`, password: 'p'.repeat(5000) },
        'password',
        'password must be at most 256 characters',
      ],
      [
        'an unknown extra field',
        {
          email: `extra.field.${tag}@test.example`,
          password: 'whatever-it-is',
          role: 'network_admin',
        },
        'role',
        'property role should not exist',
      ],
    ])('refuses %s with 400 naming the field', async (_label, body, field, message) => {
      const response = await postSignIn(body);

      expect(response.status).toBe(400);
      const error = response.body as ApiErrorBody;
      expect(error.message).toBe(`Invalid input: ${field}`);
      expect(error.fields).toEqual([{ field, messages: [message] }]);
      // Refused before the service looked the address up: no attempt was recorded for it.
      if (typeof body.email === 'string') {
        expect(await audit.count({ where: { actorEmail: body.email } })).toBe(0);
      }
    });

    it('throttles the 11th attempt for one e-mail within a minute (429)', async () => {
      // An unknown address, so the account lock-out (after 5) cannot answer first.
      const email = `throttled.${uniqueSuffix().toLowerCase()}@test.example`;
      const statuses: number[] = [];
      for (let i = 0; i < 10; i += 1) {
        statuses.push((await postSignIn({ email, password: 'guessing-again' })).status);
      }
      expect(statuses).toEqual(Array(10).fill(401));

      const eleventh = await postSignIn({ email, password: 'guessing-again' });
      expect(eleventh.status).toBe(429);
      expect((eleventh.body as ApiErrorBody).message).toBe(
        'Too many attempts in a short time. Wait a minute, then try again.',
      );
      // The throttled attempt never reached the service: ten failures recorded, not eleven.
      expect(
        await audit.count({ where: { actorEmail: email, action: 'auth.sign_in_failed' } }),
      ).toBe(10);
    });
  });

  describe('access tokens', () => {
    let person: Awaited<ReturnType<ReturnType<typeof aUser>['build']>>;
    let admin: Awaited<ReturnType<ReturnType<typeof aUser>['build']>>;
    let token: string;

    beforeAll(async () => {
      const { chapters } = await aRegion().withChapter('Token Mill').build(testApp.app);
      person = await aUser().withRole('chapter_lead').inChapter(chapters[0].id).build(testApp.app);
      admin = await aUser().withRole('network_admin').build(testApp.app);
      token = (await signIn(testApp, person.email, person.password)).token;
    });

    async function expectRefused(bearer: string) {
      const response = await me(bearer);
      expect(response.status).toBe(401);
      expect((response.body as ApiErrorBody).message).toBe(BAD_TOKEN);
    }

    it('accepts the real token (the control for the refusals below)', async () => {
      const response = await me(token).expect(200);
      expect((response.body as SessionUser).id).toBe(person.user.id);
    });

    it('refuses a malformed token', async () => {
      await expectRefused('abc');
    });

    it('refuses an expired token', async () => {
      const now = Math.floor(Date.now() / 1000);
      const expired = sign(
        { sub: person.user.id, role: 'chapter_lead', iat: now - 3600, exp: now - 60 },
        process.env.JWT_SECRET!,
        { algorithm: 'HS256', issuer: 'tallyloom', audience: 'tallyloom-api' },
      );
      await expectRefused(expired);
    });

    it("refuses a token whose payload was changed (another person's id, another role)", async () => {
      const [header, payload, signature] = token.split('.');
      const claims = JSON.parse(Buffer.from(payload, 'base64url').toString('utf8')) as Record<
        string,
        unknown
      >;
      const forged = `${header}.${base64url({ ...claims, sub: admin.user.id, role: 'network_admin' })}.${signature}`;
      await expectRefused(forged);
      const people = await testApp
        .http()
        .get('/api/users')
        .set('Authorization', `Bearer ${forged}`);
      expect(people.status).toBe(401);
    });

    it('refuses a token with alg "none" and no signature', async () => {
      const payload = token.split('.')[1];
      await expectRefused(`${base64url({ alg: 'none', typ: 'JWT' })}.${payload}.`);
    });

    it('refuses a token signed with another secret', async () => {
      const foreign = sign(
        { sub: person.user.id, role: 'chapter_lead' },
        'another-secret-that-is-long-enough-to-pass-32',
        { algorithm: 'HS256', issuer: 'tallyloom', audience: 'tallyloom-api', expiresIn: 600 },
      );
      await expectRefused(foreign);
    });

    it('refuses a valid token at once once its person is deactivated', async () => {
      const other = await aUser().withRole('auditor').build(testApp.app);
      const { token: valid } = await signIn(testApp, other.email, other.password);
      await me(valid).expect(200);

      await users.update({ active: false }, { where: { id: other.user.id } });

      const response = await me(valid);
      expect(response.status).toBe(401);
      expect((response.body as ApiErrorBody).message).toBe(
        'Your account is no longer active; please sign in again.',
      );
    });
  });

  describe('refresh and sign-out', () => {
    it('rotates the cookie; replaying the old one revokes the whole family', async () => {
      const person = await aUser().withRole('national_staff').build(testApp.app);
      const { refreshCookie: first } = await signIn(testApp, person.email, person.password);

      const rotated = await refresh(first);
      expect(rotated.status).toBe(200);
      const second = refreshCookieOf(rotated);
      expect(second).not.toBe(first);
      await me((rotated.body as SessionResponse).accessToken).expect(200);

      const replay = await refresh(first);
      expect(replay.status).toBe(401);
      expect((replay.body as ApiErrorBody).message).toBe(
        'This session was ended for safety; please sign in again.',
      );
      const afterReplay = await refresh(second);
      expect(afterReplay.status).toBe(401);

      const firstRow = await refreshTokens.findOne({ where: { tokenHash: hashOfCookie(first) } });
      const secondRow = await refreshTokens.findOne({ where: { tokenHash: hashOfCookie(second) } });
      expect(firstRow?.revokedReason).toBe('rotated');
      expect(firstRow?.replacedById).toBe(secondRow?.id);
      expect(secondRow?.revokedReason).toBe('reuse');
      expect(secondRow?.familyId).toBe(firstRow?.familyId);
      const live = await refreshTokens.count({
        where: { userId: person.user.id, revokedAt: null },
      });
      expect(live).toBe(0);
    });

    it('signs out: 204, the cookie is cleared and no longer refreshes', async () => {
      const person = await aUser().withRole('grant_writer').build(testApp.app);
      const { refreshCookie } = await signIn(testApp, person.email, person.password);

      const out = await testApp.http().post('/api/auth/sign-out').set('Cookie', refreshCookie);
      expect(out.status).toBe(204);
      const cleared = refreshSetCookieOf(out);
      expect(cleared).toMatch(/^tl_refresh=;/);
      expect(cleared).toMatch(/Expires=Thu, 01 Jan 1970/);
      expect(cleared).toMatch(/Path=\/api\/auth/);

      const again = await refresh(refreshCookie);
      expect(again.status).toBe(401);
      const row = await refreshTokens.findOne({
        where: { tokenHash: hashOfCookie(refreshCookie) },
      });
      expect(row?.revokedReason).toBe('signed_out');
    });

    it('refuses a refresh without a cookie (401)', async () => {
      const response = await testApp.http().post('/api/auth/refresh');
      expect(response.status).toBe(401);
      expect((response.body as ApiErrorBody).message).toBe(
        'No session to continue; please sign in.',
      );
    });
  });

  describe('change password', () => {
    it('checks the current password and the policy, then ends the other sessions only', async () => {
      const person = await aUser().withRole('regional_coordinator').build(testApp.app);
      const here = await signIn(testApp, person.email, person.password);
      const elsewhere = await signIn(testApp, person.email, person.password);
      const change = (body: object) =>
        testApp
          .http()
          .post('/api/auth/change-password')
          .set('Authorization', `Bearer ${here.token}`)
          .set('Cookie', here.refreshCookie)
          .send(body);
      const hashBefore = (await users.findByPk(person.user.id))!.passwordHash;

      const wrongCurrent = await change({
        currentPassword: 'not-my-password',
        newPassword: 'quiet teal yarn by the winter window',
      });
      expect(wrongCurrent.status).toBe(400);
      expect((wrongCurrent.body as ApiErrorBody).fields).toEqual([
        { field: 'currentPassword', messages: ['Current password is incorrect.'] },
      ]);

      // 'password123' is in @zxcvbn-ts/language-common's dictionary.passwords, the published
      // list of common passwords the server loads.
      expect(dictionary.passwords.includes('password123')).toBe(true);
      const common = await change({ currentPassword: person.password, newPassword: 'password123' });
      expect(common.status).toBe(400);
      const commonError = common.body as ApiErrorBody;
      expect(commonError.message).toBe('Invalid input: newPassword');
      expect(commonError.fields).toEqual([
        {
          field: 'newPassword',
          messages: ['This password is on a list of commonly used passwords; choose another.'],
        },
      ]);

      const short = await change({ currentPassword: person.password, newPassword: 'Tea7&ab' });
      expect(short.status).toBe(400);
      expect((short.body as ApiErrorBody).fields).toEqual([
        { field: 'newPassword', messages: ['Use at least 8 characters.'] },
      ]);
      expect((await users.findByPk(person.user.id))!.passwordHash).toBe(hashBefore);

      const passphrase = 'quiet teal yarn by the winter window';
      await change({ currentPassword: person.password, newPassword: passphrase }).expect(204);

      const old = await postSignIn({ email: person.email, password: person.password });
      expect(old.status).toBe(401);
      await signIn(testApp, person.email, passphrase);

      expect((await refresh(elsewhere.refreshCookie)).status).toBe(401);
      const elsewhereRow = await refreshTokens.findOne({
        where: { tokenHash: hashOfCookie(elsewhere.refreshCookie) },
      });
      expect(elsewhereRow?.revokedReason).toBe('password_changed');
      expect((await refresh(here.refreshCookie)).status).toBe(200);
    });
  });
});
