import { getConnectionToken } from '@nestjs/sequelize';
import {
  conclusion,
  drawSample,
  SAMPLE_PRNG,
  upperDeviationLimit,
  type ApiErrorBody,
  type AuditSamplePage,
  type AuditSampleView,
  type DrawSampleRequest,
  type SamplePlanRequest,
  type SamplePlanView,
} from '@tallyloom/core';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { elfExecutable, tinyPdf } from './fixtures/receipts';
import { signedIn } from './support/people-builders';
import { fieldsNamed } from './support/setup-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(120_000);

// The demo network's North Ridge region in the first quarter of 2026: its chapters are the seed's
// alone (other suites build regions of their own), so its population holds still during the run.
const REGION = 'North Ridge';
const QUARTER = { from: '2026-01', to: '2026-03' };
const FIXED_SEED = 'e2e-north-ridge-2026-q1';

describe('audit samples on the demo network', () => {
  const uploadsDir = mkdtempSync(join(tmpdir(), 'tallyloom-samples-'));
  let testApp: TestApp;
  let sequelize: Sequelize;
  let auditor: string;
  let regionId: number;
  let receiptIds: number[];

  beforeAll(async () => {
    // Its own uploads folder, so no job processors (see receipts-scans.e2e-spec.ts).
    testApp = await startTestApp({ UPLOADS_DIR: uploadsDir, JOB_PROCESSORS: 'off' });
    sequelize = testApp.app.get<Sequelize>(getConnectionToken());
    auditor = (await signedIn(testApp, 'auditor')).token;
    const [region] = await sequelize.query<{ id: number }>(
      'SELECT id FROM regions WHERE name = :name',
      { replacements: { name: REGION }, type: QueryTypes.SELECT },
    );
    regionId = region.id;
    receiptIds = (
      await sequelize.query<{ id: number }>(
        `SELECT r.id FROM parcel_receipts r JOIN chapters c ON c.id = r.chapter_id
          WHERE c.region_id = :regionId AND r.received_on BETWEEN '2026-01-01' AND '2026-03-31'
          ORDER BY r.id`,
        { replacements: { regionId }, type: QueryTypes.SELECT },
      )
    ).map((row) => Number(row.id));
  });
  afterAll(async () => {
    await testApp.close();
    rmSync(uploadsDir, { recursive: true, force: true });
  });

  const receiptsPlan = (overrides: Partial<SamplePlanRequest> = {}): SamplePlanRequest => ({
    population: { kind: 'parcel-receipts', scope: 'region', scopeId: regionId, ...QUARTER },
    confidence: 0.95,
    tolerableRate: 0.05,
    expectedDeviations: 0,
    ...overrides,
  });
  const postPlan = (token: string, body: object) =>
    testApp.http().post('/api/samples/plan').set('Authorization', `Bearer ${token}`).send(body);
  const postDraw = (token: string, body: object) =>
    testApp.http().post('/api/samples').set('Authorization', `Bearer ${token}`).send(body);
  const record = (token: string, sampleId: number, itemId: number) =>
    testApp
      .http()
      .put(`/api/samples/${sampleId}/items/${itemId}`)
      .set('Authorization', `Bearer ${token}`);

  describe('an auditor plans, draws and records a sample of parcel receipts for a quarter', () => {
    let sample: AuditSampleView;

    it('plans 59 items at 95 % / 5 % / 0 expected, on the population SQL counts', async () => {
      // The demo gives North Ridge dozens of parcels a month: the check covers a real population.
      expect(receiptIds.length).toBeGreaterThan(59);
      const response = await postPlan(auditor, receiptsPlan()).expect(200);
      const plan = response.body as SamplePlanView;
      expect(plan.population).toBe(receiptIds.length);
      // Source: AICPA Audit Sampling guide (2017), Appendix A, Table A-1: 5 % risk, 5 %, 0 → 59.
      expect(plan.sampleSize).toBe(59);
      expect(plan.itemsToDraw).toBe(59);
      expect(plan.examineWholePopulation).toBe(false);
      expect(plan.request.population).toEqual({
        kind: 'parcel-receipts',
        scope: 'region',
        scopeId: regionId,
        ...QUARTER,
      });
    });

    it('counts approved monthly tallies by month, as SQL does', async () => {
      const [{ n }] = await sequelize.query<{ n: number }>(
        `SELECT COUNT(*) AS n FROM monthly_tallies t JOIN chapters c ON c.id = t.chapter_id
          WHERE c.region_id = :regionId AND t.month BETWEEN '2026-01-01' AND '2026-03-01'
            AND t.approved_revision IS NOT NULL`,
        { replacements: { regionId }, type: QueryTypes.SELECT },
      );
      expect(Number(n)).toBeGreaterThan(0);
      const response = await postPlan(auditor, {
        ...receiptsPlan(),
        population: { kind: 'tallies', scope: 'region', scopeId: regionId, ...QUARTER },
      }).expect(200);
      const plan = response.body as SamplePlanView;
      expect(plan.population).toBe(Number(n));
      // Fewer tallies than the binomial n: every one is examined.
      expect(plan.examineWholePopulation).toBe(Number(n) <= 59);
      expect(plan.itemsToDraw).toBe(Math.min(59, Number(n)));
    });

    it('draws with a seed: the items are the seeded draw of the population, stored in draw order', async () => {
      const response = await postDraw(auditor, { plan: receiptsPlan(), seed: FIXED_SEED }).expect(
        201,
      );
      sample = response.body as AuditSampleView;
      const expected = drawSample(receiptIds, 59, FIXED_SEED).drawOrder;
      expect(sample.seed).toBe(FIXED_SEED);
      expect(sample.prng).toBe(SAMPLE_PRNG);
      expect(sample.plan.population).toBe(receiptIds.length);
      expect(sample.items.map((item) => item.itemId)).toEqual(expected);
      expect(sample.items.map((item) => item.position)).toEqual(expected.map((_, i) => i + 1));
      expect(sample.items.every((item) => item.result === null)).toBe(true);
      expect(sample.worksheet).toEqual({ examined: 0, deviations: 0, evaluation: null });

      const [stored] = await sequelize.query<{ seed: string; population_size: number; n: number }>(
        `SELECT s.seed, s.population_size, (SELECT COUNT(*) FROM audit_sample_items i
            WHERE i.sample_id = s.id) AS n FROM audit_samples s WHERE s.id = :id`,
        { replacements: { id: sample.id }, type: QueryTypes.SELECT },
      );
      expect([stored.seed, Number(stored.population_size), Number(stored.n)]).toEqual([
        FIXED_SEED,
        receiptIds.length,
        59,
      ]);
      const [entry] = await sequelize.query<{ n: number }>(
        `SELECT COUNT(*) AS n FROM audit_entries
          WHERE action = 'audit_sample.drawn' AND entity_id = :id`,
        { replacements: { id: String(sample.id) }, type: QueryTypes.SELECT },
      );
      expect(Number(entry.n)).toBe(1);
    });

    it('draws the same items in the same order again with the same seed', async () => {
      const again = (
        await postDraw(auditor, { plan: receiptsPlan(), seed: FIXED_SEED }).expect(201)
      ).body as AuditSampleView;
      expect(again.id).not.toBe(sample.id);
      expect(again.items.map((item) => item.itemId)).toEqual(
        sample.items.map((item) => item.itemId),
      );
    });

    it('gives a fresh seed when none is sent, and that seed re-draws the same sample', async () => {
      const fresh = (await postDraw(auditor, { plan: receiptsPlan() }).expect(201))
        .body as AuditSampleView;
      expect(fresh.seed).toMatch(/^[0-9a-f]{4}(-[0-9a-f]{4}){3}$/);
      const redrawn = (
        await postDraw(auditor, { plan: receiptsPlan(), seed: fresh.seed }).expect(201)
      ).body as AuditSampleView;
      expect(redrawn.items.map((item) => item.itemId)).toEqual(
        fresh.items.map((item) => item.itemId),
      );
      // A different seed picks a different sample (59 of 100+ items alike would be a broken draw).
      expect(fresh.items.map((item) => item.itemId)).not.toEqual(
        sample.items.map((item) => item.itemId),
      );
    });

    it('records two deviations (one with an attachment) and agrees for the rest', async () => {
      const [first, second, ...rest] = sample.items;
      await record(auditor, sample.id, first.itemId)
        .field('result', 'deviation')
        .field('note', 'Label says 40 panels; the receipt counts 48.')
        .attach('attachment', tinyPdf(), 'label-photo.pdf')
        .expect(200);
      await record(auditor, sample.id, second.itemId)
        .send({ result: 'deviation', note: 'Received date is a week after the postmark.' })
        .expect(200);
      let last: AuditSampleView | undefined;
      for (const item of rest) {
        last = (
          await record(auditor, sample.id, item.itemId).send({ result: 'agrees' }).expect(200)
        ).body as AuditSampleView;
      }
      const done = last!;
      expect(done.worksheet.examined).toBe(59);
      expect(done.worksheet.deviations).toBe(2);
      const limit = upperDeviationLimit({ sampleSize: 59, deviations: 2, confidence: 0.95 });
      expect(done.worksheet.evaluation?.upperDeviationLimit).toBe(limit);
      // Source: AICPA Audit Sampling guide (2017), Table A-3: n = 60 with 2 deviations → 10.2 %;
      // one item fewer can only raise the limit, and it is far above the 5 % tolerable rate.
      expect(limit).toBeGreaterThan(0.102);
      expect(done.worksheet.evaluation?.supportsReliance).toBe(false);
      expect(done.worksheet.evaluation?.text).toBe(
        conclusion({ upperLimit: limit, tolerableRate: 0.05 }).text,
      );
      expect(done.worksheet.evaluation?.text).toMatch(/does not support relying on the control/);

      const firstView = done.items.find((item) => item.itemId === first.itemId)!;
      expect(firstView).toMatchObject({
        result: 'deviation',
        note: 'Label says 40 panels; the receipt counts 48.',
      });
      const file = await testApp
        .http()
        .get(firstView.attachmentUrl!)
        .set('Authorization', `Bearer ${auditor}`)
        .buffer(true)
        .parse((res, callback) => {
          const chunks: Buffer[] = [];
          res.on('data', (chunk: Buffer) => chunks.push(chunk));
          res.on('end', () => callback(null, Buffer.concat(chunks)));
        })
        .expect(200);
      expect(file.headers['content-type']).toBe('application/pdf');
      expect(Buffer.compare(file.body as Buffer, tinyPdf())).toBe(0);
      expect(done.items.find((item) => item.itemId === second.itemId)?.attachmentUrl).toBeNull();
    });

    it('reads the sample back, and lists it newest first with its worksheet totals', async () => {
      const read = (
        await testApp
          .http()
          .get(`/api/samples/${sample.id}`)
          .set('Authorization', `Bearer ${auditor}`)
          .expect(200)
      ).body as AuditSampleView;
      expect(read.items.map((item) => item.itemId)).toEqual(
        sample.items.map((item) => item.itemId),
      );
      expect(read.worksheet.deviations).toBe(2);

      const page = (
        await testApp
          .http()
          .get('/api/samples?pageSize=100')
          .set('Authorization', `Bearer ${auditor}`)
          .expect(200)
      ).body as AuditSamplePage;
      const drawnAt = page.items.map((row) => row.drawnAt);
      expect(drawnAt).toEqual([...drawnAt].sort().reverse());
      const row = page.items.find((item) => item.id === sample.id);
      expect(row).toMatchObject({ itemCount: 59, seed: FIXED_SEED });
      expect(row?.worksheet).toEqual(read.worksheet);
    });

    it('refuses a sample or an item that does not exist (404)', async () => {
      await testApp
        .http()
        .get('/api/samples/987654321')
        .set('Authorization', `Bearer ${auditor}`)
        .expect(404);
      const notDrawn = receiptIds.find((id) => !sample.items.some((item) => item.itemId === id))!;
      await record(auditor, sample.id, notDrawn).send({ result: 'agrees' }).expect(404);
    });

    it('refuses planning, drawing and recording to staff, admins and coordinators (403)', async () => {
      const item = sample.items[2];
      for (const role of ['national_staff', 'network_admin', 'regional_coordinator'] as const) {
        const token = (
          await signedIn(testApp, role, role === 'regional_coordinator' ? { regionId } : {})
        ).token;
        const results = [
          (await postPlan(token, receiptsPlan())).status,
          (await postDraw(token, { plan: receiptsPlan(), seed: FIXED_SEED })).status,
          (await record(token, sample.id, item.itemId).send({ result: 'deviation', note: 'x' }))
            .status,
        ];
        expect({ role, results }).toEqual({ role, results: [403, 403, 403] });
      }
      const [row] = await sequelize.query<{ result: string }>(
        'SELECT result FROM audit_sample_items WHERE sample_id = :id AND item_id = :itemId',
        { replacements: { id: sample.id, itemId: item.itemId }, type: QueryTypes.SELECT },
      );
      expect(row.result).toBe('agrees');
    });
  });

  describe('bad input: a 400 naming the field, and nothing stored', () => {
    let badAuditor: string;
    let badAuditorId: number;

    beforeAll(async () => {
      const built = await signedIn(testApp, 'auditor');
      badAuditor = built.token;
      badAuditorId = built.user.id;
    });

    /** Samples drawn and audit entries written by this test's auditor. */
    async function storedByBadAuditor(): Promise<[number, number]> {
      const [samples] = await sequelize.query<{ n: number }>(
        'SELECT COUNT(*) AS n FROM audit_samples WHERE drawn_by = :id',
        { replacements: { id: badAuditorId }, type: QueryTypes.SELECT },
      );
      const [entries] = await sequelize.query<{ n: number }>(
        "SELECT COUNT(*) AS n FROM audit_entries WHERE actor_user_id = :id AND action LIKE 'audit_sample.%'",
        { replacements: { id: badAuditorId }, type: QueryTypes.SELECT },
      );
      return [Number(samples.n), Number(entries.n)];
    }

    /** The plan is refused naming `field`, and a draw of it naming `plan.<field>`. */
    async function refused(plan: object, field: string): Promise<void> {
      const planned = await postPlan(badAuditor, plan);
      expect({ status: planned.status, fields: fieldsNamed(planned.body) }).toEqual({
        status: 400,
        fields: [field],
      });
      const drawn = await postDraw(badAuditor, { plan, seed: FIXED_SEED });
      expect({ status: drawn.status, fields: fieldsNamed(drawn.body) }).toEqual({
        status: 400,
        fields: [`plan.${field}`],
      });
      expect(await storedByBadAuditor()).toEqual([0, 0]);
    }

    it('a confidence other than 90 % or 95 %', async () => {
      await refused(receiptsPlan({ confidence: 0.99 as 0.95 }), 'confidence');
      await refused(receiptsPlan({ confidence: 95 as 0.95 }), 'confidence');
    });

    it('a tolerable rate of 0, below 0, or above 50 %', async () => {
      for (const tolerableRate of [0, -0.05, 0.6, 5]) {
        await refused(receiptsPlan({ tolerableRate }), 'tolerableRate');
      }
    });

    it('expected deviations as many as the population, or too many for the tolerable rate', async () => {
      const [chapter] = await sequelize.query<{ id: number; n: number }>(
        `SELECT c.id, COUNT(*) AS n FROM parcel_receipts r JOIN chapters c ON c.id = r.chapter_id
          WHERE c.region_id = :regionId AND r.received_on BETWEEN '2026-01-01' AND '2026-01-31'
          GROUP BY c.id ORDER BY n, c.id LIMIT 1`,
        { replacements: { regionId }, type: QueryTypes.SELECT },
      );
      const oneMonth = { kind: 'parcel-receipts', scope: 'chapter', scopeId: chapter.id };
      await refused(
        {
          ...receiptsPlan({ expectedDeviations: Number(chapter.n) }),
          population: { ...oneMonth, from: '2026-01', to: '2026-01' },
        },
        'expectedDeviations',
      );
      // 5 % of the quarter's receipts is a handful; expecting as many as the sample's whole
      // binomial n leaves nothing a sample could show.
      await refused(receiptsPlan({ expectedDeviations: 59 }), 'expectedDeviations');
    });

    it('an empty population: a quarter with no receipts', async () => {
      const plan = receiptsPlan({
        population: {
          kind: 'parcel-receipts',
          scope: 'region',
          scopeId: regionId,
          from: '2019-01',
          to: '2019-03',
        },
      });
      await refused(plan, 'population');
      const response = await postPlan(badAuditor, plan);
      expect((response.body as ApiErrorBody).message).toBe('Invalid input: population');
    });

    it('an unknown population kind, and months the wrong way round', async () => {
      await refused(
        { ...receiptsPlan(), population: { ...receiptsPlan().population, kind: 'donations' } },
        'population.kind',
      );
      await refused(
        {
          ...receiptsPlan(),
          population: { ...receiptsPlan().population, from: '2026-03', to: '2026-01' },
        },
        'population.to',
      );
    });

    it('a region outside the network is not found (404), and nothing is stored', async () => {
      const plan = receiptsPlan({
        population: { kind: 'parcel-receipts', scope: 'region', scopeId: 987654321, ...QUARTER },
      });
      expect((await postPlan(badAuditor, plan)).status).toBe(404);
      expect((await postDraw(badAuditor, { plan } satisfies DrawSampleRequest)).status).toBe(404);
      expect(await storedByBadAuditor()).toEqual([0, 0]);
    });

    it('a deviation without a note, or with an attachment that is not a document', async () => {
      const drawn = (await postDraw(auditor, { plan: receiptsPlan() }).expect(201))
        .body as AuditSampleView;
      const item = drawn.items[0];
      const withoutNote = await record(badAuditor, drawn.id, item.itemId).send({
        result: 'deviation',
      });
      expect({ status: withoutNote.status, fields: fieldsNamed(withoutNote.body) }).toEqual({
        status: 400,
        fields: ['note'],
      });
      const blankNote = await record(badAuditor, drawn.id, item.itemId)
        .field('result', 'deviation')
        .field('note', '   ');
      expect({ status: blankNote.status, fields: fieldsNamed(blankNote.body) }).toEqual({
        status: 400,
        fields: ['note'],
      });
      const program = await record(badAuditor, drawn.id, item.itemId)
        .field('result', 'deviation')
        .field('note', 'See the attached.')
        .attach('attachment', elfExecutable(), 'photo.pdf');
      expect({ status: program.status, fields: fieldsNamed(program.body) }).toEqual({
        status: 415,
        fields: ['attachment'],
      });
      const unknownResult = await record(badAuditor, drawn.id, item.itemId).send({
        result: 'maybe',
      });
      expect({ status: unknownResult.status, fields: fieldsNamed(unknownResult.body) }).toEqual({
        status: 400,
        fields: ['result'],
      });
      const [row] = await sequelize.query<{ result: string | null; attachment_key: string | null }>(
        `SELECT result, attachment_key FROM audit_sample_items
          WHERE sample_id = :id AND item_id = :itemId`,
        { replacements: { id: drawn.id, itemId: item.itemId }, type: QueryTypes.SELECT },
      );
      expect(row).toEqual({ result: null, attachment_key: null });
      expect(await storedByBadAuditor()).toEqual([0, 0]);
    });
  });

  describe('an auditor writes nothing outside sampling', () => {
    it('is refused logging a receipt, approving a tally and changing settings (403)', async () => {
      const [tally] = await sequelize.query<{ id: number }>(
        "SELECT id FROM monthly_tallies WHERE state = 'submitted' ORDER BY id LIMIT 1",
        { type: QueryTypes.SELECT },
      );
      const [chapter] = await sequelize.query<{ id: number }>(
        'SELECT id FROM chapters WHERE region_id = :regionId ORDER BY id LIMIT 1',
        { replacements: { regionId }, type: QueryTypes.SELECT },
      );
      const http = () => testApp.http();
      const statuses = {
        receipt: (
          await http()
            .post('/api/receipts')
            .set('Authorization', `Bearer ${auditor}`)
            .send({ chapterId: chapter.id, receivedOn: '2026-01-04', panelsAccepted: 1 })
        ).status,
        approve: (
          await http()
            .post(`/api/tallies/${tally?.id ?? 1}/approve`)
            .set('Authorization', `Bearer ${auditor}`)
            .send({})
        ).status,
        settings: (
          await http().put('/api/settings').set('Authorization', `Bearer ${auditor}`).send({})
        ).status,
      };
      expect(statuses).toEqual({ receipt: 403, approve: 403, settings: 403 });
    });
  });
});
