import { getConnectionToken } from '@nestjs/sequelize';
import type {
  AuditSampleView,
  CreateFindingRequest,
  FindingPage,
  FindingView,
} from '@tallyloom/core';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { signedIn } from './support/people-builders';
import { fieldsNamed } from './support/setup-builders';
import { startTestApp, uniqueSuffix, type TestApp } from './support/test-app';

jest.setTimeout(120_000);

interface AuditRow {
  action: string;
  actor_user_id: number;
  before_json: unknown;
  after_json: unknown;
}

const json = (value: unknown) =>
  (typeof value === 'string' ? JSON.parse(value) : value) as Record<string, unknown> | null;

describe('audit findings', () => {
  let testApp: TestApp;
  let sequelize: Sequelize;
  const tokens: Record<string, string> = {};
  let auditorId: number;
  let staffName: string;
  let adminName: string;
  let regionId: number;
  let chapterId: number;
  let tallyId: number;
  let receiptId: number;
  let sample: AuditSampleView;

  beforeAll(async () => {
    testApp = await startTestApp();
    sequelize = testApp.app.get<Sequelize>(getConnectionToken());
    const auditor = await signedIn(testApp, 'auditor');
    auditorId = auditor.user.id;
    tokens.auditor = auditor.token;
    tokens.otherAuditor = (await signedIn(testApp, 'auditor')).token;
    const staff = await signedIn(testApp, 'national_staff');
    tokens.staff = staff.token;
    staffName = staff.user.displayName;
    const admin = await signedIn(testApp, 'network_admin');
    tokens.admin = admin.token;
    adminName = admin.user.displayName;
    tokens.grantWriter = (await signedIn(testApp, 'grant_writer')).token;

    const [row] = await sequelize.query<{ region_id: number; chapter_id: number }>(
      `SELECT c.region_id, c.id AS chapter_id FROM chapters c JOIN regions r ON r.id = c.region_id
        WHERE r.name = 'North Ridge' ORDER BY c.id LIMIT 1`,
      { type: QueryTypes.SELECT },
    );
    regionId = Number(row.region_id);
    chapterId = Number(row.chapter_id);
    tokens.chapterLead = (await signedIn(testApp, 'chapter_lead', { chapterId })).token;
    tokens.coordinator = (await signedIn(testApp, 'regional_coordinator', { regionId })).token;
    const [tally] = await sequelize.query<{ id: number }>(
      'SELECT id FROM monthly_tallies WHERE chapter_id = :chapterId ORDER BY id LIMIT 1',
      { replacements: { chapterId }, type: QueryTypes.SELECT },
    );
    tallyId = Number(tally.id);
    const [receipt] = await sequelize.query<{ id: number }>(
      'SELECT id FROM parcel_receipts WHERE chapter_id = :chapterId ORDER BY id LIMIT 1',
      { replacements: { chapterId }, type: QueryTypes.SELECT },
    );
    receiptId = Number(receipt.id);
    // A small real sample to link to: a month of the region's receipts at 20 % tolerable rate.
    sample = (
      await testApp
        .http()
        .post('/api/samples')
        .set('Authorization', `Bearer ${tokens.auditor}`)
        .send({
          plan: {
            population: {
              kind: 'parcel-receipts',
              scope: 'region',
              scopeId: regionId,
              from: '2026-01',
              to: '2026-01',
            },
            confidence: 0.95,
            tolerableRate: 0.2,
            expectedDeviations: 0,
          },
          seed: 'findings-e2e',
        })
        .expect(201)
    ).body as AuditSampleView;
  });
  afterAll(() => testApp.close());

  const as = (who: string) => ({
    get: (path: string) => testApp.http().get(path).set('Authorization', `Bearer ${tokens[who]}`),
    post: (path: string, body: object) =>
      testApp.http().post(path).set('Authorization', `Bearer ${tokens[who]}`).send(body),
    patch: (path: string, body: object) =>
      testApp.http().patch(path).set('Authorization', `Bearer ${tokens[who]}`).send(body),
  });
  const aFinding = (overrides: Partial<CreateFindingRequest> = {}): CreateFindingRequest => ({
    title: `Receipts without scans ${uniqueSuffix()}`,
    body: 'Three receipts behind the January panels have no label scan.',
    severity: 'medium',
    ...overrides,
  });
  const create = async (overrides: Partial<CreateFindingRequest> = {}) =>
    (await as('auditor').post('/api/findings', aFinding(overrides)).expect(201))
      .body as FindingView;
  const auditTrail = (id: number) =>
    sequelize.query<AuditRow>(
      `SELECT action, actor_user_id, before_json, after_json FROM audit_entries
        WHERE entity_type = 'audit_finding' AND entity_id = :id ORDER BY id`,
      { replacements: { id: String(id) }, type: QueryTypes.SELECT },
    );
  const countRows = async (table: string, where: string, replacements: Record<string, unknown>) => {
    const [row] = await sequelize.query<{ n: number }>(
      `SELECT COUNT(*) AS n FROM ${table} WHERE ${where}`,
      { replacements, type: QueryTypes.SELECT },
    );
    return Number(row.n);
  };

  describe('an auditor writes a finding linked to a trace, a sample, an item, a tally and a receipt', () => {
    let finding: FindingView;

    it('stores the finding open, with its links in canonical form, and audits it', async () => {
      const item = sample.items[0];
      finding = await create({
        links: [
          // Written loosely on purpose: the trace's own parser gives the canonical form.
          { kind: 'trace', reference: `region:${regionId}:2026-Q1` },
          { kind: 'sample', reference: String(sample.id) },
          { kind: 'sample_item', reference: `${sample.id}:${item.itemId}` },
          { kind: 'tally', reference: String(tallyId) },
          { kind: 'receipt', reference: ` ${receiptId} ` },
        ],
      });
      expect(finding.status).toBe('open');
      expect(finding.version).toBe(1);
      expect(finding.createdById).toBe(auditorId);
      expect(finding.responses).toEqual([]);
      expect(finding.links).toEqual([
        { kind: 'trace', reference: `region:${regionId}:2026-Q1` },
        { kind: 'sample', reference: String(sample.id) },
        { kind: 'sample_item', reference: `${sample.id}:${item.itemId}` },
        { kind: 'tally', reference: String(tallyId) },
        { kind: 'receipt', reference: String(receiptId) },
      ]);
      const again = (await as('staff').get(`/api/findings/${finding.id}`).expect(200))
        .body as FindingView;
      expect(again.links).toEqual(finding.links);
      expect(again.title).toBe(finding.title);

      const trail = await auditTrail(finding.id);
      expect(trail.map((entry) => entry.action)).toEqual(['finding.created']);
      expect(Number(trail[0].actor_user_id)).toBe(auditorId);
      expect(json(trail[0].after_json)).toMatchObject({ title: finding.title, status: 'open' });
    });

    it('lists it for staff and admins, filtered by status and severity', async () => {
      const high = await create({ severity: 'high' });
      const page = (await as('admin').get('/api/findings?severity=high&pageSize=100').expect(200))
        .body as FindingPage;
      expect(page.items.some((item) => item.id === high.id)).toBe(true);
      expect(page.items.some((item) => item.id === finding.id)).toBe(false);
      expect(page.items.every((item) => item.severity === 'high')).toBe(true);
      const open = (await as('staff').get('/api/findings?status=open&pageSize=100').expect(200))
        .body as FindingPage;
      expect(open.items.some((item) => item.id === finding.id)).toBe(true);
      expect(open.items.every((item) => item.status === 'open')).toBe(true);
      const first = (await as('staff').get('/api/findings?pageSize=1&page=1').expect(200))
        .body as FindingPage;
      expect(first.items).toHaveLength(1);
      expect(first.total).toBeGreaterThanOrEqual(2);
      // Newest first.
      const ids = (
        (await as('auditor').get('/api/findings?pageSize=100').expect(200)).body as FindingPage
      ).items.map((item) => item.id);
      expect(ids.indexOf(high.id)).toBeLessThan(ids.indexOf(finding.id));
    });

    it('keeps every response, in order, and marks the finding responded', async () => {
      const first = (
        await as('staff')
          .post(`/api/findings/${finding.id}/responses`, {
            body: 'The chapter is scanning the labels this week.',
          })
          .expect(201)
      ).body as FindingView;
      expect(first.status).toBe('responded');
      expect(first.version).toBe(2);
      const second = (
        await as('admin')
          .post(`/api/findings/${finding.id}/responses`, { body: 'Scans now attached.' })
          .expect(201)
      ).body as FindingView;
      expect(second.responses.map((r) => [r.body, r.respondedBy])).toEqual([
        ['The chapter is scanning the labels this week.', staffName],
        ['Scans now attached.', adminName],
      ]);
      expect(second.responseCount).toBe(2);
      const trail = await auditTrail(finding.id);
      expect(trail.map((entry) => entry.action)).toEqual([
        'finding.created',
        'finding.responded',
        'finding.responded',
      ]);
      finding = second;
    });

    it('lets its author edit it, adding links but never dropping one, with the edit audited', async () => {
      const edited = (
        await as('auditor')
          .patch(`/api/findings/${finding.id}`, {
            version: finding.version,
            severity: 'high',
            addLinks: [
              { kind: 'tally', reference: String(tallyId) },
              { kind: 'trace', reference: `chapter:${chapterId}:2026-01` },
            ],
          })
          .expect(200)
      ).body as FindingView;
      expect(edited.severity).toBe('high');
      expect(edited.title).toBe(finding.title);
      expect(edited.version).toBe(finding.version + 1);
      expect(edited.links).toEqual([
        ...finding.links,
        { kind: 'trace', reference: `chapter:${chapterId}:2026-01` },
      ]);
      // The responses stay with the edited finding.
      expect(edited.responses).toEqual(finding.responses);
      const trail = await auditTrail(finding.id);
      const last = trail[trail.length - 1];
      expect(last.action).toBe('finding.updated');
      expect(json(last.before_json)).toMatchObject({ severity: 'medium' });
      expect(json(last.after_json)).toMatchObject({ severity: 'high' });
      finding = edited;
    });

    it('refuses an edit on a stale version (409 with the finding as it is now)', async () => {
      const response = await as('auditor')
        .patch(`/api/findings/${finding.id}`, { version: finding.version - 1, title: 'Late' })
        .expect(409);
      const current = (response.body as { current: FindingView }).current;
      expect(current.version).toBe(finding.version);
      expect(current.title).toBe(finding.title);
      const stored = (await as('auditor').get(`/api/findings/${finding.id}`).expect(200))
        .body as FindingView;
      expect(stored.title).toBe(finding.title);
    });

    it("refuses another auditor's edit (403), but lets any auditor close it", async () => {
      await as('otherAuditor')
        .patch(`/api/findings/${finding.id}`, { version: finding.version, title: 'Mine now' })
        .expect(403);
      await as('otherAuditor')
        .post(`/api/findings/${finding.id}/close`, { version: finding.version - 1 })
        .expect(409);
      const closed = (
        await as('otherAuditor')
          .post(`/api/findings/${finding.id}/close`, { version: finding.version })
          .expect(200)
      ).body as FindingView;
      expect(closed.status).toBe('closed');
      expect(closed.closedAt).not.toBeNull();
      const trail = await auditTrail(finding.id);
      expect(trail[trail.length - 1].action).toBe('finding.closed');
      finding = closed;
    });

    it('keeps a closed finding as it is: no edit, no response, no second close', async () => {
      await as('auditor')
        .patch(`/api/findings/${finding.id}`, { version: finding.version, title: 'Reopened?' })
        .expect(409);
      await as('staff')
        .post(`/api/findings/${finding.id}/responses`, { body: 'One more thing.' })
        .expect(409);
      await as('auditor')
        .post(`/api/findings/${finding.id}/close`, { version: finding.version })
        .expect(409);
      const stored = (await as('staff').get(`/api/findings/${finding.id}`).expect(200))
        .body as FindingView;
      expect(stored.responses).toHaveLength(2);
      expect(stored.version).toBe(finding.version);
    });
  });

  describe('bad input is a 400 naming the field, and nothing is stored', () => {
    const refused = async (body: object, field: string) => {
      const title = `Refused ${uniqueSuffix()}`;
      const response = await as('auditor')
        .post('/api/findings', { ...aFinding(), title, ...body })
        .expect(400);
      expect(fieldsNamed(response.body)).toEqual([field]);
      expect(await countRows('audit_findings', 'title = :title', { title })).toBe(0);
    };

    it('an empty title', async () => {
      const response = await as('auditor')
        .post('/api/findings', { ...aFinding(), title: '   ' })
        .expect(400);
      expect(fieldsNamed(response.body)).toEqual(['title']);
    });

    it('an unknown severity', () => refused({ severity: 'critical' }, 'severity'));

    it('an unknown link kind', () =>
      refused({ links: [{ kind: 'dashboard', reference: '1' }] }, 'links.0.kind'));

    it('a trace reference that does not parse', () =>
      refused(
        {
          links: [
            { kind: 'sample', reference: String(sample.id) },
            { kind: 'trace', reference: 'region:three:2026-Q1' },
          ],
        },
        'links.1.reference',
      ));

    it('a sample that does not exist', () =>
      refused({ links: [{ kind: 'sample', reference: '987654321' }] }, 'links.0.reference'));

    it('a sample item that is not in the sample', () =>
      refused(
        { links: [{ kind: 'sample_item', reference: `${sample.id}:987654321` }] },
        'links.0.reference',
      ));

    it('a receipt that does not exist', () =>
      refused({ links: [{ kind: 'receipt', reference: '987654321' }] }, 'links.0.reference'));

    it('a bad link on an edit leaves the finding as it was', async () => {
      const finding = await create();
      const response = await as('auditor')
        .patch(`/api/findings/${finding.id}`, {
          version: finding.version,
          title: 'Changed with a bad link',
          addLinks: [{ kind: 'tally', reference: 'twelve' }],
        })
        .expect(400);
      expect(fieldsNamed(response.body)).toEqual(['addLinks.0.reference']);
      const stored = (await as('auditor').get(`/api/findings/${finding.id}`).expect(200))
        .body as FindingView;
      expect([stored.title, stored.version]).toEqual([finding.title, 1]);
    });

    it('an empty response', async () => {
      const finding = await create();
      const response = await as('staff')
        .post(`/api/findings/${finding.id}/responses`, { body: '' })
        .expect(400);
      expect(fieldsNamed(response.body)).toEqual(['body']);
      expect(
        await countRows('audit_finding_responses', 'finding_id = :id', { id: finding.id }),
      ).toBe(0);
    });
  });

  describe('who may do what', () => {
    let finding: FindingView;
    beforeAll(async () => {
      finding = await create();
    });

    it('refuses an auditor responding (403): auditors write findings, not answers', async () => {
      await as('auditor')
        .post(`/api/findings/${finding.id}/responses`, { body: 'Answering myself.' })
        .expect(403);
      expect(
        await countRows('audit_finding_responses', 'finding_id = :id', { id: finding.id }),
      ).toBe(0);
    });

    it('refuses staff and admins creating, editing or closing findings (403)', async () => {
      for (const who of ['staff', 'admin']) {
        await as(who).post('/api/findings', aFinding()).expect(403);
        await as(who)
          .patch(`/api/findings/${finding.id}`, { version: finding.version, title: 'Softer' })
          .expect(403);
        await as(who)
          .post(`/api/findings/${finding.id}/close`, { version: finding.version })
          .expect(403);
      }
      const stored = (await as('auditor').get(`/api/findings/${finding.id}`).expect(200))
        .body as FindingView;
      expect([stored.title, stored.status, stored.version]).toEqual([finding.title, 'open', 1]);
    });

    it('refuses chapter leads, coordinators and grant writers reading findings (403)', async () => {
      for (const who of ['chapterLead', 'coordinator', 'grantWriter']) {
        await as(who).get('/api/findings').expect(403);
        await as(who).get(`/api/findings/${finding.id}`).expect(403);
      }
    });

    it('answers 404 for a finding that does not exist', async () => {
      await as('staff').get('/api/findings/987654321').expect(404);
      await as('staff').post('/api/findings/987654321/responses', { body: 'Hello' }).expect(404);
    });
  });
});
