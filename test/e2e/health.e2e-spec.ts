import type { HealthReport } from '@tallyloom/core';
import { startTestApp, type TestApp } from './support/test-app';

describe('GET /api/health', () => {
  let testApp: TestApp;
  beforeAll(async () => {
    testApp = await startTestApp();
  });
  afterAll(() => testApp.close());

  it('reports the real MariaDB and the Bull queues on the real Redis as up', async () => {
    const response = await testApp.http().get('/api/health').expect(200);
    const report = response.body as HealthReport;
    expect(report.status).toBe('ok');
    expect(report.database.status).toBe('up');
    expect(report.database.version).toMatch(/MariaDB/);
    expect(report.queue.status).toBe('up');
    expect(report.queue.queues?.map((q) => q.name)).toContain('reports');
    expect(report.version).toMatch(/^\d+\.\d+\.\d+/);
  });

  it('gives every response a request id, and keeps one the caller sent', async () => {
    const generated = await testApp.http().get('/api/health');
    expect(generated.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    const echoed = await testApp.http().get('/api/health').set('X-Request-Id', 'trace-abc-12345');
    expect(echoed.headers['x-request-id']).toBe('trace-abc-12345');
  });

  it('sets security headers (helmet)', async () => {
    const response = await testApp.http().get('/api/health');
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['content-security-policy']).toContain("default-src 'self'");
  });
});

describe('GET /api/health with Redis unreachable', () => {
  let testApp: TestApp;
  beforeAll(async () => {
    // Port 1 on loopback: nothing listens there, so the queue probe must fail fast.
    testApp = await startTestApp({ REDIS_URL: 'redis://127.0.0.1:1' });
  });
  afterAll(() => testApp.close());

  it('answers 503 "degraded", names the queue as down and the database as up', async () => {
    const response = await testApp.http().get('/api/health').expect(503);
    const report = response.body as HealthReport;
    expect(report.status).toBe('degraded');
    expect(report.queue.status).toBe('down');
    expect(report.queue.error).toBeTruthy();
    expect(report.database.status).toBe('up');
  });
});
