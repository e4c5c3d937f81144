import { getConnectionToken, getModelToken } from '@nestjs/sequelize';
import type {
  AuditLogEntryView,
  AuditLogPage,
  AuditVerificationView,
  UserView,
} from '@tallyloom/core';
import { QueryTypes, Sequelize } from 'sequelize';
import * as XLSX from 'xlsx';
import { AuditChainSealer } from '../../services/api/src/audit/audit-chain-sealer.service';
import { AuditService } from '../../services/api/src/audit/audit.service';
import { AuditEntry } from '../../services/api/src/audit/models/audit-entry.model';
import { aRegion } from './support/network-builders';
import { aUser, signedIn, type BuiltUser } from './support/people-builders';
import { fieldsNamed } from './support/setup-builders';
import { startTestApp, uniqueSuffix, type TestApp } from './support/test-app';

jest.setTimeout(120_000);

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

describe('the hash-chained audit log', () => {
  let testApp: TestApp;
  let entries: typeof AuditEntry;
  let owner: Sequelize;
  let admin: BuiltUser & { token: string };
  let auditor: BuiltUser & { token: string };
  let chapterId: number;

  beforeAll(async () => {
    testApp = await startTestApp();
    entries = testApp.app.get<typeof AuditEntry>(getModelToken(AuditEntry));
    // The schema owner: it may do what the application's account may not, like an intruder.
    owner = new Sequelize(process.env.DATABASE_MIGRATION_URL!, {
      dialect: 'mariadb',
      logging: false,
    });
    admin = await signedIn(testApp, 'network_admin');
    auditor = await signedIn(testApp, 'auditor');
    chapterId = (await aRegion().withChapter('Chain Ford').build(testApp.app)).chapters[0].id;
  });
  afterAll(async () => {
    await owner.close();
    await testApp.close();
  });

  const bearer = (token: string) => `Bearer ${token}`;
  const verify = async (token = auditor.token) => {
    const response = await testApp
      .http()
      .post('/api/audit-log/verify')
      .set('Authorization', bearer(token));
    expect(response.status).toBe(200);
    return response.body as AuditVerificationView;
  };
  const list = (query: Record<string, string | number>, token = auditor.token) =>
    testApp.http().get('/api/audit-log').query(query).set('Authorization', bearer(token));

  /** Invites someone (one 'user.invited' entry) and returns that entry's id. */
  async function anEntry(): Promise<number> {
    const id = requestId('chain');
    await testApp
      .http()
      .post('/api/users')
      .set('Authorization', bearer(admin.token))
      .set('X-Request-Id', id)
      .send({
        email: `chained.${uniqueSuffix().toLowerCase()}@test.example`,
        displayName: 'Marram Reed',
        role: 'chapter_lead',
        chapterId,
      })
      .expect(201);
    const [entry] = await entries.findAll({ where: { requestId: id } });
    return Number(entry.id);
  }

  it('seals entries written through the API and verifies the chain', async () => {
    // Sealed by the job queued after the write, or at the latest by the verification.
    const id = await anEntry();
    const result = await verify();
    expect(result).toMatchObject({ ok: true, firstBrokenLink: null });

    const sealed = (await entries.findByPk(id))!;
    expect(sealed.chainSeq).not.toBeNull();
    expect(sealed.entryHash).toMatch(/^[0-9a-f]{64}$/);
    expect(result.headChainSeq).toBeGreaterThanOrEqual(Number(sealed.chainSeq));
    expect(result.entriesChecked).toBe(result.headChainSeq);
    const previous = await entries.findOne({ where: { chainSeq: Number(sealed.chainSeq) - 1 } });
    expect(sealed.prevHash).toBe(previous ? previous.entryHash : '0'.repeat(64));

    // The run itself is recorded and audited.
    const [run] = await owner.query<{ ok: number; entries_checked: number }>(
      'SELECT ok, entries_checked FROM audit_verifications ORDER BY id DESC LIMIT 1',
      { type: QueryTypes.SELECT },
    );
    expect(Number(run.ok)).toBe(1);
    expect(Number(run.entries_checked)).toBe(result.entriesChecked);
    const audited = await entries.findAll({
      where: { action: 'audit_log.verified', actorUserId: auditor.user.id },
    });
    expect(audited.length).toBeGreaterThanOrEqual(1);
  });

  it("reports a row changed behind the application's back at exactly that link", async () => {
    const id = await anEntry();
    await verify();
    const sealed = (await entries.findByPk(id))!;
    await owner.query("UPDATE audit_entries SET action = 'user.quietly_changed' WHERE id = ?", {
      replacements: [id],
    });
    try {
      const result = await verify();
      expect(result.ok).toBe(false);
      expect(result.firstBrokenLink).toMatchObject({
        chainSeq: Number(sealed.chainSeq),
        entryId: id,
        reason: 'content-changed',
      });
      expect(result.entriesChecked).toBe(Number(sealed.chainSeq));
    } finally {
      await owner.query("UPDATE audit_entries SET action = 'user.invited' WHERE id = ?", {
        replacements: [id],
      });
    }
    expect((await verify()).ok).toBe(true);
  });

  it('reports a deleted row at its place in the chain', async () => {
    const id = await anEntry();
    await anEntry();
    await verify();
    const sealed = (await entries.findByPk(id))!;
    const holding = `audit_entries_held_${uniqueSuffix().toLowerCase()}`;
    await owner.query(`CREATE TABLE ${holding} AS SELECT * FROM audit_entries WHERE id = ?`, {
      replacements: [id],
    });
    await owner.query('DELETE FROM audit_entries WHERE id = ?', { replacements: [id] });
    try {
      const result = await verify();
      expect(result.ok).toBe(false);
      expect(result.firstBrokenLink).toMatchObject({
        chainSeq: Number(sealed.chainSeq),
        entryId: null,
        reason: 'missing',
      });
    } finally {
      await owner.query(`INSERT INTO audit_entries SELECT * FROM ${holding}`);
      await owner.query(`DROP TABLE ${holding}`);
    }
    expect((await verify()).ok).toBe(true);
  });

  it('seals entries written while several sealers run, each once and in one chain', async () => {
    const audit = testApp.app.get(AuditService);
    const sealer = testApp.app.get(AuditChainSealer);
    const sequelize = testApp.app.get<Sequelize>(getConnectionToken());
    const marker = requestId('race');
    const writes = Array.from({ length: 40 }, (_, i) =>
      sequelize.transaction((transaction) =>
        audit.record(
          { actor: null, requestId: marker, ip: null },
          { action: 'test.raced', entityType: 'test', entityId: i },
          transaction,
        ),
      ),
    );
    const seals = [sealer.sealPending(), sealer.sealPending(), sealer.sealPending()];
    await Promise.all([...writes, ...seals]);

    expect((await verify()).ok).toBe(true);
    const raced = await entries.findAll({ where: { requestId: marker } });
    expect(raced).toHaveLength(40);
    const places = raced.map((entry) => Number(entry.chainSeq));
    expect(places.every((place) => place > 0)).toBe(true);
    expect(new Set(places).size).toBe(40);
  });

  it('lets admins verify, and refuses verification to the other roles', async () => {
    expect((await verify(admin.token)).ok).toBe(true);
    for (const role of ['national_staff', 'grant_writer', 'chapter_lead'] as const) {
      const person = await signedIn(testApp, role, role === 'chapter_lead' ? { chapterId } : {});
      const response = await testApp
        .http()
        .post('/api/audit-log/verify')
        .set('Authorization', bearer(person.token));
      expect([role, response.status]).toEqual([role, 403]);
    }
  });

  describe('the viewer', () => {
    let first: number;
    let second: number;
    beforeAll(async () => {
      first = await anEntry();
      second = await anEntry();
    });

    it('lists newest first, with the sealed state and chain position', async () => {
      await verify();
      const response = await list({ who: admin.email, what: 'user.invited', pageSize: 100 });
      expect(response.status).toBe(200);
      const page = response.body as AuditLogPage;
      const ids = page.items.map((item) => item.id);
      expect(ids).toEqual([...ids].sort((a, b) => b - a));
      const row = page.items.find((item) => item.id === second)!;
      expect(row).toMatchObject({ sealed: true, actorEmail: admin.email, action: 'user.invited' });
      expect(row.chainSeq).toBeGreaterThan(0);
      expect(ids.indexOf(second)).toBeLessThan(ids.indexOf(first));
    });

    it('filters by who (e-mail or user id), what (prefix), entity and day', async () => {
      const target = (await entries.findByPk(second))!;
      const byEntity = (await list({ entityType: 'user', entityId: target.entityId! }))
        .body as AuditLogPage;
      expect(byEntity.items.map((item) => item.id)).toEqual([second]);
      expect(byEntity.total).toBe(1);

      const byUserId = (await list({ who: String(admin.user.id), pageSize: 100 }))
        .body as AuditLogPage;
      expect(byUserId.items.map((item) => item.id)).toEqual(
        expect.arrayContaining([first, second]),
      );
      expect(byUserId.items.every((item) => item.actorUserId === admin.user.id)).toBe(true);

      const byPrefix = (await list({ what: 'user.inv', who: admin.email, pageSize: 100 }))
        .body as AuditLogPage;
      expect(byPrefix.items.length).toBeGreaterThanOrEqual(2);
      expect(byPrefix.items.every((item) => item.action.startsWith('user.inv'))).toBe(true);

      const today = target.occurredAt.toISOString().slice(0, 10);
      const tomorrow = new Date(target.occurredAt.getTime() + 86_400_000)
        .toISOString()
        .slice(0, 10);
      const entity = { entityType: 'user', entityId: target.entityId! };
      expect(((await list({ ...entity, from: today, to: today })).body as AuditLogPage).total).toBe(
        1,
      );
      expect(((await list({ ...entity, from: tomorrow })).body as AuditLogPage).total).toBe(0);
      expect(((await list({ ...entity, to: '2020-01-01' })).body as AuditLogPage).total).toBe(0);
    });

    it('pages through the results', async () => {
      const query = { who: admin.email, what: 'user.invited' };
      const all = (await list({ ...query, pageSize: 2 })).body as AuditLogPage;
      const pageTwo = (await list({ ...query, pageSize: 1, page: 2 })).body as AuditLogPage;
      expect(pageTwo).toMatchObject({ page: 2, pageSize: 1, total: all.total });
      expect(pageTwo.items.map((item) => item.id)).toEqual([all.items[1].id]);
    });

    it('exports the filtered log as xlsx, the same rows as the list', async () => {
      const query = { who: admin.email, what: 'user.' };
      const listed = (await list({ ...query, pageSize: 100 })).body as AuditLogPage;
      const response = await testApp
        .http()
        .get('/api/audit-log/export')
        .query(query)
        .set('Authorization', bearer(auditor.token))
        .buffer(true)
        .parse((res, callback) => {
          const chunks: Buffer[] = [];
          res.on('data', (chunk: Buffer) => chunks.push(chunk));
          res.on('end', () => callback(null, Buffer.concat(chunks)));
        });
      expect(response.status).toBe(200);
      expect(response.headers['content-disposition']).toMatch(
        /attachment; filename="tallyloom-audit-log-/,
      );
      const workbook = XLSX.read(response.body as Buffer, { type: 'buffer' });
      const rows = XLSX.utils.sheet_to_json<unknown[]>(workbook.Sheets['Audit log'], {
        header: 1,
      });
      expect(rows[0]).toEqual(expect.arrayContaining(['Entry', 'Action', 'Entry hash (SHA-256)']));
      const exportedIds = rows.slice(1).map((row) => Number(row[0]));
      // Entries written between the two requests would only add newer rows on top.
      expect(exportedIds.slice(-listed.items.length)).toEqual(listed.items.map((item) => item.id));
      const actionColumn = (rows[0] as string[]).indexOf('Action');
      expect(rows.slice(1).every((row) => String(row[actionColumn]).startsWith('user.'))).toBe(
        true,
      );
    });

    it('is refused to roles without audit.read', async () => {
      for (const role of ['national_staff', 'grant_writer', 'chapter_lead'] as const) {
        const person = await signedIn(testApp, role, role === 'chapter_lead' ? { chapterId } : {});
        expect([role, (await list({}, person.token)).status]).toEqual([role, 403]);
        const exported = await testApp
          .http()
          .get('/api/audit-log/export')
          .set('Authorization', bearer(person.token));
        expect([role, exported.status]).toEqual([role, 403]);
      }
      expect((await list({}, admin.token)).status).toBe(200);
    });

    it.each([
      [{ from: '2026-02-30' }, 'from'],
      [{ to: '26-01-01' }, 'to'],
      [{ from: '2026-03-02', to: '2026-03-01' }, 'to'],
      [{ pageSize: 500 }, 'pageSize'],
      [{ page: 0 }, 'page'],
      [{ who: 'x'.repeat(255) }, 'who'],
      [{ what: 'y'.repeat(65) }, 'what'],
    ])('refuses %o with a 400 naming %s', async (query, field) => {
      const response = await list(query);
      expect(response.status).toBe(400);
      expect(fieldsNamed(response.body)).toEqual([field]);
    });

    it('treats LIKE wildcards in a filter as plain characters', async () => {
      const page = (await list({ what: '%' })).body as AuditLogPage;
      expect(page.items.every((item: AuditLogEntryView) => item.action.startsWith('%'))).toBe(true);
      expect(page.total).toBe(0);
    });
  });
});
