import { getModelToken } from '@nestjs/sequelize';
import type { ApiErrorBody, BlanketSizeView, VolunteerHourValueView } from '@tallyloom/core';
import { BlanketSize } from '../../services/api/src/blanket-sizes/models/blanket-size.model';
import { VolunteerHourValue } from '../../services/api/src/settings/models/volunteer-hour-value.model';
import { aRegion } from './support/network-builders';
import { signedIn } from './support/people-builders';
import { aBlanketSize, aRequestId, auditedBy, fieldsNamed } from './support/setup-builders';
import { startTestApp, uniqueSuffix, type TestApp } from './support/test-app';

jest.setTimeout(30_000);

describe('network set-up: blanket sizes and volunteer hour values', () => {
  let testApp: TestApp;
  let sizes: typeof BlanketSize;
  let values: typeof VolunteerHourValue;
  let admin: string;
  let staff: string;
  let lead: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    sizes = testApp.app.get<typeof BlanketSize>(getModelToken(BlanketSize));
    values = testApp.app.get<typeof VolunteerHourValue>(getModelToken(VolunteerHourValue));
    admin = `Bearer ${(await signedIn(testApp, 'network_admin')).token}`;
    staff = `Bearer ${(await signedIn(testApp, 'national_staff')).token}`;
    const { chapters } = await aRegion().withChapter('Catalogue Mill').build(testApp.app);
    lead = `Bearer ${(await signedIn(testApp, 'chapter_lead', { chapterId: chapters[0].id })).token}`;
  });
  afterAll(() => testApp.close());

  const get = (url: string, auth = admin) => testApp.http().get(url).set('Authorization', auth);
  const send = (
    method: 'post' | 'patch',
    url: string,
    body: object,
    auth = admin,
    requestId = aRequestId(`catalogue-${method}`),
  ) => {
    const http = testApp.http();
    return (method === 'post' ? http.post(url) : http.patch(url))
      .set('Authorization', auth)
      .set('X-Request-Id', requestId)
      .send(body);
  };

  describe('blanket sizes', () => {
    it('lists the seeded catalogue with panels and finished size from the size chart', async () => {
      const listed = (await get('/api/blanket-sizes', lead).expect(200)).body as BlanketSizeView[];
      const byName = new Map(listed.map((size) => [size.name, size]));
      // Grids nearest the chart targets (see packages/core size-chart.spec.ts); 1 in = 2.54 cm.
      expect(byName.get('Baby')).toMatchObject({
        columns: 5,
        rows: 4,
        panels: 20,
        widthIn: 35,
        heightIn: 36,
      });
      expect(byName.get('Child')).toMatchObject({
        columns: 6,
        rows: 7,
        panels: 42,
        widthIn: 42,
        heightIn: 63,
      });
      expect(byName.get('Lap')).toMatchObject({
        columns: 5,
        rows: 5,
        panels: 25,
        widthIn: 35,
        heightIn: 45,
      });
      expect(byName.get('Adult throw')).toMatchObject({
        columns: 7,
        rows: 7,
        panels: 49,
        widthIn: 49,
        heightIn: 63,
        widthCm: 124.46,
        heightCm: 160.02,
        active: true,
      });
      expect(byName.get('Lap')?.sourceNote).toContain(
        'Craft Yarn Council, Standard Blanket Sizes chart (from memory)',
      );
    });

    it('creates a size, computing panels and the finished size, and audits it', async () => {
      const name = `Stroller ${uniqueSuffix()}`;
      const requestId = aRequestId('size-create');
      const response = await send(
        'post',
        '/api/blanket-sizes',
        { name, columns: 4, rows: 3, sortOrder: 15, sourceNote: '  Asked for by a ward  ' },
        admin,
        requestId,
      );
      expect(response.status).toBe(201);
      const size = response.body as BlanketSizeView;
      // by hand: 4 × 7 = 28 in = 71.12 cm; 3 × 9 = 27 in = 68.58 cm
      expect(size).toEqual({
        id: size.id,
        name,
        columns: 4,
        rows: 3,
        panels: 12,
        widthIn: 28,
        heightIn: 27,
        widthCm: 71.12,
        heightCm: 68.58,
        active: true,
        sortOrder: 15,
        sourceNote: 'Asked for by a ward',
      });
      expect(await auditedBy(testApp.app, requestId)).toEqual([
        expect.objectContaining({
          action: 'blanket_size.created',
          entityType: 'blanket_size',
          entityId: String(size.id),
          after: {
            name,
            columns: 4,
            rows: 3,
            active: true,
            sortOrder: 15,
            sourceNote: 'Asked for by a ward',
          },
        }),
      ]);
    });

    const GRID = (field: string) => `${field} must be a whole number from 1 to 20`;
    it.each([
      ['columns', { columns: 0 }, GRID('columns')],
      ['columns', { columns: 21 }, GRID('columns')],
      ['columns', { columns: 2.5 }, GRID('columns')],
      ['rows', { rows: 'six' }, GRID('rows')],
      ['rows', { rows: undefined }, GRID('rows')],
      ['name', { name: 'N'.repeat(61) }, 'name must be at most 60 characters'],
      ['sortOrder', { sortOrder: -1 }, 'sortOrder must be a whole number from 0 to 9,999'],
      ['sourceNote', { sourceNote: 'S'.repeat(256) }, 'sourceNote must be at most 255 characters'],
    ])(
      'refuses a bad %s with 400 naming it, and stores nothing (%j)',
      async (field, override, message) => {
        const name = `Refused Size ${uniqueSuffix()}`;
        const requestId = aRequestId('size-bad');
        const body = JSON.parse(
          JSON.stringify({ name, columns: 5, rows: 6, ...override }),
        ) as object;
        const response = await send('post', '/api/blanket-sizes', body, admin, requestId);
        expect(response.status).toBe(400);
        expect((response.body as ApiErrorBody).fields).toEqual([{ field, messages: [message] }]);
        expect(await sizes.count({ where: { name } })).toBe(0);
        expect(await auditedBy(testApp.app, requestId)).toEqual([]);
      },
    );

    it('refuses a name already in use (409 name), whatever the case', async () => {
      const existing = await aBlanketSize().build(testApp.app);
      const response = await send('post', '/api/blanket-sizes', {
        name: existing.name.toLowerCase(),
        columns: 2,
        rows: 2,
      });
      expect(response.status).toBe(409);
      expect(fieldsNamed(response.body)).toEqual(['name']);
      expect(await sizes.count({ where: { name: existing.name } })).toBe(1);
    });

    it('retires and regrids a size with PATCH, auditing before and after', async () => {
      const size = await aBlanketSize().withGrid(5, 5).build(testApp.app);
      const requestId = aRequestId('size-update');
      const response = await send(
        'patch',
        `/api/blanket-sizes/${size.id}`,
        { rows: 6, active: false },
        admin,
        requestId,
      );
      expect(response.status).toBe(200);
      expect(response.body as BlanketSizeView).toMatchObject({
        name: size.name,
        columns: 5,
        rows: 6,
        panels: 30,
        active: false,
      });
      const [entry] = await auditedBy(testApp.app, requestId);
      expect(entry).toMatchObject({
        action: 'blanket_size.updated',
        before: { rows: 5, active: true },
        after: { rows: 6, active: false },
      });
    });

    it('shows retired sizes to admins who ask, never to others', async () => {
      const retired = await aBlanketSize().inactive().build(testApp.app);
      const ids = async (url: string, auth: string) =>
        ((await get(url, auth).expect(200)).body as BlanketSizeView[]).map((size) => size.id);
      expect(await ids('/api/blanket-sizes', admin)).not.toContain(retired.id);
      expect(await ids('/api/blanket-sizes?includeInactive=true', admin)).toContain(retired.id);
      expect(await ids('/api/blanket-sizes?includeInactive=true', lead)).not.toContain(retired.id);
      expect(await ids('/api/blanket-sizes?includeInactive=true', staff)).not.toContain(retired.id);
    });

    it('refuses an includeInactive that is not true or false (400)', async () => {
      const response = await get('/api/blanket-sizes?includeInactive=maybe').expect(400);
      expect(fieldsNamed(response.body)).toEqual(['includeInactive']);
    });

    it('refuses national staff (403) and changes nothing', async () => {
      const size = await aBlanketSize().build(testApp.app);
      const response = await send('patch', `/api/blanket-sizes/${size.id}`, { columns: 9 }, staff);
      expect(response.status).toBe(403);
      expect((await sizes.findByPk(size.id))?.columns).toBe(5);
    });
  });

  describe('volunteer hour values', () => {
    /** A data year no other row uses; only this file writes these rows. */
    async function freeYear(): Promise<number> {
      const used = new Set((await values.findAll()).map((row) => row.dataYear));
      const free = Array.from({ length: 31 }, (_, i) => 1990 + i).filter((year) => !used.has(year));
      return free[Math.floor(Math.random() * free.length)];
    }

    it('lists the seeded values with their published source, to every role', async () => {
      const listed = (await get('/api/settings/volunteer-hour-values', lead).expect(200))
        .body as VolunteerHourValueView[];
      expect(listed.find((row) => row.dataYear === 2022)).toMatchObject({
        hourlyValue: 31.8,
        currency: 'USD',
        source: 'Independent Sector, Value of Volunteer Time (2022 data, released 2023)',
      });
      expect(listed.find((row) => row.dataYear === 2023)).toMatchObject({
        hourlyValue: 33.49,
        source: expect.stringContaining('from memory') as unknown,
      });
    });

    it('creates a value (currency defaults to USD) and audits it', async () => {
      const dataYear = await freeYear();
      const requestId = aRequestId('hour-create');
      const response = await send(
        'post',
        '/api/settings/volunteer-hour-values',
        { dataYear, hourlyValue: 28.5, source: 'A test source' },
        admin,
        requestId,
      );
      expect(response.status).toBe(201);
      const value = response.body as VolunteerHourValueView;
      expect(value).toEqual({
        id: value.id,
        dataYear,
        hourlyValue: 28.5,
        currency: 'USD',
        source: 'A test source',
      });
      expect(await auditedBy(testApp.app, requestId)).toEqual([
        expect.objectContaining({
          action: 'volunteer_hour_value.created',
          entityType: 'volunteer_hour_value',
          entityId: String(value.id),
          after: { dataYear, hourlyValue: 28.5, currency: 'USD', source: 'A test source' },
        }),
      ]);
    });

    const VALUE = 'hourlyValue must be more than 0 and at most 1,000, with at most 2 decimals';
    const YEAR = 'dataYear must be a whole number from 1,990 to 2,100';
    it.each([
      ['dataYear', { dataYear: 1989 }, YEAR],
      ['dataYear', { dataYear: 2101 }, YEAR],
      ['dataYear', { dataYear: 2020.5 }, YEAR],
      ['hourlyValue', { hourlyValue: 0 }, VALUE],
      ['hourlyValue', { hourlyValue: -3 }, VALUE],
      ['hourlyValue', { hourlyValue: 1000.01 }, VALUE],
      ['hourlyValue', { hourlyValue: 12.345 }, VALUE],
      ['hourlyValue', { hourlyValue: '31.80' }, VALUE],
      ['source', { source: '' }, 'source is required'],
      ['source', { source: undefined }, 'source must be text'],
      ['source', { source: 'S'.repeat(256) }, 'source must be at most 255 characters'],
      ['currency', { currency: 'DOLLARS' }, 'currency must be a three-letter code such as USD'],
    ])(
      'refuses a bad %s with 400 naming it, and stores nothing (%j)',
      async (field, override, message) => {
        const dataYear = await freeYear();
        const requestId = aRequestId('hour-bad');
        const body = JSON.parse(
          JSON.stringify({ dataYear, hourlyValue: 20, source: 'A test source', ...override }),
        ) as object;
        const response = await send(
          'post',
          '/api/settings/volunteer-hour-values',
          body,
          admin,
          requestId,
        );
        expect(response.status).toBe(400);
        expect((response.body as ApiErrorBody).fields).toEqual([{ field, messages: [message] }]);
        expect(await values.count({ where: { dataYear } })).toBe(0);
        expect(await auditedBy(testApp.app, requestId)).toEqual([]);
      },
    );

    it('accepts the edges of the hourly value: 0.01 and 1,000', async () => {
      const dataYear = await freeYear();
      const low = await send('post', '/api/settings/volunteer-hour-values', {
        dataYear,
        hourlyValue: 0.01,
        source: 'Edge',
      });
      expect(low.status).toBe(201);
      const high = await send(
        'patch',
        `/api/settings/volunteer-hour-values/${(low.body as VolunteerHourValueView).id}`,
        {
          hourlyValue: 1000,
        },
      );
      expect(high.status).toBe(200);
      expect((high.body as VolunteerHourValueView).hourlyValue).toBe(1000);
    });

    it('refuses a data year already in use (409 dataYear) and stores nothing', async () => {
      const before = await values.count({ where: { dataYear: 2022 } });
      const response = await send('post', '/api/settings/volunteer-hour-values', {
        dataYear: 2022,
        hourlyValue: 99,
        source: 'A second opinion',
      });
      expect(response.status).toBe(409);
      expect(fieldsNamed(response.body)).toEqual(['dataYear']);
      expect(await values.count({ where: { dataYear: 2022 } })).toBe(before);
    });

    it('changes a value with PATCH, auditing before and after; another year is refused (409)', async () => {
      const dataYear = await freeYear();
      const created = await values.create({
        dataYear,
        hourlyValue: '25.00',
        currency: 'USD',
        source: 'Before',
      });
      const requestId = aRequestId('hour-update');
      const response = await send(
        'patch',
        `/api/settings/volunteer-hour-values/${created.id}`,
        { hourlyValue: 26.75, source: 'After' },
        admin,
        requestId,
      );
      expect(response.status).toBe(200);
      expect(response.body as VolunteerHourValueView).toMatchObject({
        hourlyValue: 26.75,
        source: 'After',
      });
      const [entry] = await auditedBy(testApp.app, requestId);
      expect(entry).toMatchObject({
        action: 'volunteer_hour_value.updated',
        before: { dataYear, hourlyValue: 25, source: 'Before' },
        after: { dataYear, hourlyValue: 26.75, source: 'After' },
      });

      const clash = await send('patch', `/api/settings/volunteer-hour-values/${created.id}`, {
        dataYear: 2023,
      });
      expect(clash.status).toBe(409);
      expect(fieldsNamed(clash.body)).toEqual(['dataYear']);
      expect((await values.findByPk(created.id))?.dataYear).toBe(dataYear);
    });

    it('refuses national staff (403) and stores nothing', async () => {
      const dataYear = await freeYear();
      const response = await send(
        'post',
        '/api/settings/volunteer-hour-values',
        { dataYear, hourlyValue: 20, source: 'Staff' },
        staff,
      );
      expect(response.status).toBe(403);
      expect(await values.count({ where: { dataYear } })).toBe(0);
    });
  });
});
