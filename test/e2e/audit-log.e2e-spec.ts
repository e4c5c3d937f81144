import { getModelToken } from '@nestjs/sequelize';
import type { UserView } from '@tallyloom/core';
import { QueryTypes, Sequelize } from 'sequelize';
import { AuditEntry } from '../../services/api/src/audit/models/audit-entry.model';
import { aRegion } from './support/network-builders';
import { aUser, signedIn, type BuiltUser } from './support/people-builders';
import { startTestApp, uniqueSuffix, type TestApp } from './support/test-app';

jest.setTimeout(30_000);

/** A request id of our own, so the entries of one request can be found among everyone's. */
const requestId = (what: string) => `audit-${what}-${uniqueSuffix().toLowerCase()}`;

/** JSON columns may come back parsed or as text, depending on the driver. */
function json(value: unknown): Record<string, unknown> | null {
  if (value === null || value === undefined) return null;
  return (typeof value === 'string' ? JSON.parse(value) : value) as Record<string, unknown>;
}

describe('audit log', () => {
  let testApp: TestApp;
  let entries: typeof AuditEntry;
  let admin: BuiltUser & { token: string };
  let chapterId: number;

  beforeAll(async () => {
    testApp = await startTestApp();
    entries = testApp.app.get<typeof AuditEntry>(getModelToken(AuditEntry));
    admin = await signedIn(testApp, 'network_admin');
    chapterId = (await aRegion().withChapter('Ledger Mill').build(testApp.app)).chapters[0].id;
  });
  afterAll(() => testApp.close());

  const byRequest = (id: string) =>
    entries.findAll({ where: { requestId: id }, order: [['id', 'ASC']] });
  const signInAs = (email: string, password: string, id: string) =>
    testApp.http().post('/api/auth/sign-in').set('X-Request-Id', id).send({ email, password });
  const invite = (email: string, id: string) =>
    testApp
      .http()
      .post('/api/users')
      .set('Authorization', `Bearer ${admin.token}`)
      .set('X-Request-Id', id)
      .send({ email, displayName: 'Juniper Vale', role: 'chapter_lead', chapterId });

  it("records a sign-in as 'auth.sign_in' under the response's request id", async () => {
    const person = await aUser().withRole('auditor').build(testApp.app);
    const id = requestId('signin');
    const response = await signInAs(person.email, person.password, id);
    expect(response.status).toBe(200);
    expect(response.headers['x-request-id']).toBe(id);

    const recorded = await byRequest(id);
    expect(recorded.map((e) => e.action)).toEqual(['auth.sign_in']);
    expect(recorded[0]).toMatchObject({
      entityType: 'user',
      entityId: String(person.user.id),
      actorEmail: person.email,
    });
    expect(recorded[0].occurredAt.getTime()).toBeGreaterThan(Date.now() - 60_000);
  });

  it("records a failed sign-in as 'auth.sign_in_failed' with the address tried", async () => {
    const person = await aUser().withRole('grant_writer').build(testApp.app);
    const id = requestId('failed');
    const response = await signInAs(person.email, 'not-the-password', id);
    expect(response.status).toBe(401);
    expect(response.headers['x-request-id']).toBe(id);

    const recorded = await byRequest(id);
    expect(recorded.map((e) => e.action)).toEqual(['auth.sign_in_failed']);
    expect(recorded[0]).toMatchObject({
      actorEmail: person.email,
      actorUserId: null,
      entityId: String(person.user.id),
    });
    expect(json(recorded[0].afterJson)).toEqual({ failedAttempts: 1 });
  });

  it('uses the generated request id when the caller sends none', async () => {
    const person = await aUser().withRole('national_staff').build(testApp.app);
    const response = await testApp
      .http()
      .post('/api/auth/sign-in')
      .send({ email: person.email, password: person.password })
      .expect(200);
    const generated = String(response.headers['x-request-id']);
    expect(generated).toMatch(/^[0-9a-f-]{36}$/);
    const recorded = await entries.findAll({
      where: { action: 'auth.sign_in', entityId: String(person.user.id) },
    });
    expect(recorded.map((e) => e.requestId)).toEqual([generated]);
  });

  it("records an invitation as 'user.invited', by the admin, without any password hash", async () => {
    const email = `audited.${uniqueSuffix().toLowerCase()}@test.example`;
    const id = requestId('invite');
    const response = await invite(email, id);
    expect(response.status).toBe(201);
    expect(response.headers['x-request-id']).toBe(id);
    const invited = response.body as UserView;

    const recorded = await byRequest(id);
    expect(recorded.map((e) => e.action)).toEqual(['user.invited']);
    expect(recorded[0]).toMatchObject({
      actorUserId: admin.user.id,
      actorEmail: admin.email,
      entityType: 'user',
      entityId: String(invited.id),
    });
    const after = json(recorded[0].afterJson);
    expect(after).toMatchObject({ email, role: 'chapter_lead', chapterId, active: true });
    expect(Object.keys(after!).filter((key) => /password/i.test(key))).toEqual([]);
    expect(json(recorded[0].beforeJson)).toBeNull();
  });

  it('records an update with before and after, and never the password hash', async () => {
    const person = await aUser().withRole('auditor').build(testApp.app);
    const id = requestId('update');
    const response = await testApp
      .http()
      .patch(`/api/users/${person.user.id}`)
      .set('Authorization', `Bearer ${admin.token}`)
      .set('X-Request-Id', id)
      .send({ displayName: 'Rowan Thistle' });
    expect(response.status).toBe(200);
    expect(response.headers['x-request-id']).toBe(id);

    const recorded = await byRequest(id);
    expect(recorded.map((e) => e.action)).toEqual(['user.updated']);
    expect(json(recorded[0].beforeJson)).toMatchObject({
      displayName: person.user.displayName,
      role: 'auditor',
    });
    expect(json(recorded[0].afterJson)).toMatchObject({
      displayName: 'Rowan Thistle',
      role: 'auditor',
    });
    const text = JSON.stringify([recorded[0].beforeJson, recorded[0].afterJson]);
    expect(text).not.toMatch(/password/i);
    expect(text).not.toContain('$2');
  });

  it('leaves no entry for an invitation that fails (duplicate e-mail, 409)', async () => {
    const email = `twice.${uniqueSuffix().toLowerCase()}@test.example`;
    const first = requestId('first');
    await invite(email, first).expect(201);
    const second = requestId('second');
    const response = await invite(email, second);
    expect(response.status).toBe(409);
    expect(response.headers['x-request-id']).toBe(second);

    expect(await byRequest(second)).toEqual([]);
    expect((await byRequest(first)).map((e) => e.action)).toEqual(['user.invited']);
  });

  describe("the application's database account", () => {
    let asApp: Sequelize;
    beforeAll(() => {
      asApp = new Sequelize(process.env.DATABASE_URL!, { dialect: 'mariadb', logging: false });
    });
    afterAll(() => asApp.close());

    it('may read and append audit entries, but not change or delete them', async () => {
      const marker = requestId('grants');
      const [count] = await asApp.query<{ n: number }>('SELECT COUNT(*) AS n FROM audit_entries', {
        type: QueryTypes.SELECT,
      });
      expect(Number(count.n)).toBeGreaterThan(0);

      await asApp.query(
        "INSERT INTO audit_entries (action, entity_type, request_id) VALUES ('test.probe', 'test', ?)",
        { replacements: [marker] },
      );
      await expect(
        asApp.query("UPDATE audit_entries SET action = 'test.rewritten' WHERE request_id = ?", {
          replacements: [marker],
        }),
      ).rejects.toThrow(/denied/i);
      await expect(
        asApp.query('DELETE FROM audit_entries WHERE request_id = ?', { replacements: [marker] }),
      ).rejects.toThrow(/denied/i);

      const rows = await asApp.query<{ action: string }>(
        'SELECT action FROM audit_entries WHERE request_id = ?',
        { replacements: [marker], type: QueryTypes.SELECT },
      );
      expect(rows).toEqual([{ action: 'test.probe' }]);
    });
  });
});
