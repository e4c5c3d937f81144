import { getModelToken } from '@nestjs/sequelize';
import type { ApiErrorBody, NetworkSettings } from '@tallyloom/core';
import { Setting } from '../../services/api/src/settings/models/setting.model';
import { signedIn } from './support/people-builders';
import { aRequestId, auditedBy, fieldsNamed } from './support/setup-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(30_000);

/** JSON columns may come back parsed or as text, depending on the driver. */
const jsonOf = (value: unknown): unknown =>
  typeof value === 'string' ? (JSON.parse(value) as unknown) : value;

/**
 * Settings are shared by the whole test database. The seed stores the defaults, so removing the
 * rows changes nothing another suite can see; the one change made here (the fiscal year's first
 * month) is read by no other feature yet, and is put back after each test. The reminder days are
 * read by the reminders suite, so they are only ever written with their defaults here.
 */
describe('network set-up: settings', () => {
  let testApp: TestApp;
  let settings: typeof Setting;
  let admin: string;
  let adminId: number;
  let stored: Array<{ key: string; value: unknown }>;

  beforeAll(async () => {
    testApp = await startTestApp();
    settings = testApp.app.get<typeof Setting>(getModelToken(Setting));
    const built = await signedIn(testApp, 'network_admin');
    admin = `Bearer ${built.token}`;
    adminId = built.user.id;
  });
  beforeEach(async () => {
    stored = (await settings.findAll()).map((row) => ({ key: row.key, value: jsonOf(row.value) }));
  });
  afterEach(async () => {
    await settings.destroy({ where: {} });
    await settings.bulkCreate(stored);
  });
  afterAll(() => testApp.close());

  const get = (auth = admin) => testApp.http().get('/api/settings').set('Authorization', auth);
  const put = (body: object, auth = admin, requestId = aRequestId('settings')) =>
    testApp
      .http()
      .put('/api/settings')
      .set('Authorization', auth)
      .set('X-Request-Id', requestId)
      .send(body);
  const DEFAULTS: NetworkSettings = {
    // common practice: a July–June fiscal year is a common US non-profit choice
    fiscalYearStartMonth: 7,
    // common practice: charity panel guidance commonly accepts about ±½ in
    panelToleranceIn: 0.5,
    receiptCountCeiling: 10_000,
    servedPerBlanketWarnFactor: 3,
    reminderDaysBeforeDue: 3,
    reminderDaysAfterDue: 2,
  };

  it('answers the defaults when nothing is stored, to every role', async () => {
    await settings.destroy({ where: {} });
    for (const role of ['grant_writer', 'auditor'] as const) {
      const { token } = await signedIn(testApp, role);
      expect((await get(`Bearer ${token}`).expect(200)).body).toEqual(DEFAULTS);
    }
  });

  it('shows the seeded settings, stored as the defaults', async () => {
    expect(stored.map((row) => row.key).sort()).toEqual([
      'fiscalYearStartMonth',
      'panelToleranceIn',
      'receiptCountCeiling',
      'reminderDaysAfterDue',
      'reminderDaysBeforeDue',
      'servedPerBlanketWarnFactor',
    ]);
    expect((await get().expect(200)).body).toEqual(DEFAULTS);
  });

  it('replaces the settings with PUT, storing the row and auditing before and after', async () => {
    const requestId = aRequestId('settings-put');
    const changed = { ...DEFAULTS, fiscalYearStartMonth: 1 };
    const response = await put(changed, admin, requestId);
    expect(response.status).toBe(200);
    expect(response.body).toEqual(changed);
    expect((await get().expect(200)).body).toEqual(changed);

    const row = await settings.findByPk('fiscalYearStartMonth');
    expect(row?.updatedBy).toBe(adminId);
    expect(jsonOf(row?.value)).toBe(1);
    expect(await auditedBy(testApp.app, requestId)).toEqual([
      expect.objectContaining({
        action: 'setting.updated',
        entityType: 'setting',
        entityId: 'fiscalYearStartMonth',
        actorUserId: adminId,
        before: DEFAULTS,
        after: changed,
      }),
    ]);
  });

  it('takes a served-per-blanket factor with one decimal', async () => {
    const changed = { ...DEFAULTS, servedPerBlanketWarnFactor: 2.5 };
    expect((await put(changed).expect(200)).body).toEqual(changed);
    expect((await get().expect(200)).body).toEqual(changed);
  });

  it('writes no audit entry when nothing changes', async () => {
    const requestId = aRequestId('settings-same');
    await put(DEFAULTS, admin, requestId).expect(200);
    expect(await auditedBy(testApp.app, requestId)).toEqual([]);
  });

  const MONTH = 'fiscalYearStartMonth must be a whole number from 1 to 12';
  const TOLERANCE =
    'panelToleranceIn must be a number of inches from 0 to 3, with at most 2 decimals';
  const CEILING = 'receiptCountCeiling must be a whole number from 1 to 1,000,000';
  const FACTOR =
    'servedPerBlanketWarnFactor must be a number from 1 to 100, with at most 1 decimal';
  const BEFORE = 'reminderDaysBeforeDue must be a whole number from 1 to 28';
  const AFTER = 'reminderDaysAfterDue must be a whole number from 1 to 28';
  it.each([
    ['fiscalYearStartMonth', { fiscalYearStartMonth: 0 }, MONTH],
    ['fiscalYearStartMonth', { fiscalYearStartMonth: 13 }, MONTH],
    ['fiscalYearStartMonth', { fiscalYearStartMonth: 6.5 }, MONTH],
    ['fiscalYearStartMonth', { fiscalYearStartMonth: undefined }, MONTH],
    ['panelToleranceIn', { panelToleranceIn: -0.1 }, TOLERANCE],
    ['panelToleranceIn', { panelToleranceIn: 3.01 }, TOLERANCE],
    ['panelToleranceIn', { panelToleranceIn: 0.125 }, TOLERANCE],
    ['panelToleranceIn', { panelToleranceIn: '0.5' }, TOLERANCE],
    ['receiptCountCeiling', { receiptCountCeiling: 0 }, CEILING],
    ['receiptCountCeiling', { receiptCountCeiling: 1_000_001 }, CEILING],
    ['servedPerBlanketWarnFactor', { servedPerBlanketWarnFactor: 0.9 }, FACTOR],
    ['servedPerBlanketWarnFactor', { servedPerBlanketWarnFactor: 100.5 }, FACTOR],
    ['servedPerBlanketWarnFactor', { servedPerBlanketWarnFactor: 2.25 }, FACTOR],
    ['servedPerBlanketWarnFactor', { servedPerBlanketWarnFactor: '3' }, FACTOR],
    ['servedPerBlanketWarnFactor', { servedPerBlanketWarnFactor: undefined }, FACTOR],
    ['reminderDaysBeforeDue', { reminderDaysBeforeDue: 0 }, BEFORE],
    ['reminderDaysBeforeDue', { reminderDaysBeforeDue: 29 }, BEFORE],
    ['reminderDaysBeforeDue', { reminderDaysBeforeDue: 1.5 }, BEFORE],
    ['reminderDaysAfterDue', { reminderDaysAfterDue: undefined }, AFTER],
    ['reminderDaysAfterDue', { reminderDaysAfterDue: '2' }, AFTER],
  ])(
    'refuses a bad %s with 400 naming it, and stores nothing (%j)',
    async (field, override, message) => {
      const requestId = aRequestId('settings-bad');
      const body = JSON.parse(
        JSON.stringify({ ...DEFAULTS, fiscalYearStartMonth: 3, ...override }),
      ) as object;
      const response = await put(body, admin, requestId);
      expect(response.status).toBe(400);
      expect((response.body as ApiErrorBody).fields).toEqual([{ field, messages: [message] }]);
      expect((await get().expect(200)).body).toEqual(DEFAULTS);
      expect(await auditedBy(testApp.app, requestId)).toEqual([]);
    },
  );

  it('refuses national staff (403) and changes nothing', async () => {
    const { token } = await signedIn(testApp, 'national_staff');
    const response = await put({ ...DEFAULTS, fiscalYearStartMonth: 4 }, `Bearer ${token}`);
    expect(response.status).toBe(403);
    expect((await get().expect(200)).body).toEqual(DEFAULTS);
  });

  it('refuses an unknown setting (400 naming it)', async () => {
    const response = await put({ ...DEFAULTS, colourScheme: 'teal' });
    expect(response.status).toBe(400);
    expect(fieldsNamed(response.body)).toEqual(['colourScheme']);
  });
});
