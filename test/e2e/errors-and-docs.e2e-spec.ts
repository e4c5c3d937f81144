import type { ApiErrorBody } from '@tallyloom/core';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { startTestApp, WEB_DIST, type TestApp } from './support/test-app';

describe('unknown routes, OpenAPI and the served web app', () => {
  let testApp: TestApp;
  beforeAll(async () => {
    testApp = await startTestApp({ SERVE_WEB: 'true', WEB_DIST_DIR: WEB_DIST });
  });
  afterAll(() => testApp.close());

  it('answers an unknown API route with a JSON 404 carrying the request id', async () => {
    const response = await testApp.http().get('/api/no-such-thing').expect(404);
    expect(response.headers['content-type']).toMatch(/application\/json/);
    const body = response.body as ApiErrorBody;
    expect(body).toMatchObject({ statusCode: 404, error: 'Not Found', path: '/api/no-such-thing' });
    expect(body.requestId).toBe(response.headers['x-request-id']);
  });

  it('publishes the OpenAPI document with the network and health routes', async () => {
    const response = await testApp.http().get('/api/docs-json').expect(200);
    const paths = Object.keys((response.body as { paths: Record<string, unknown> }).paths);
    expect(paths).toEqual(expect.arrayContaining(['/api/health', '/api/regions', '/api/chapters']));
    await testApp.http().get('/api/docs').expect(200).expect('content-type', /html/);
  });

  it('serves the built web app, and index.html for client routes', async () => {
    expect(existsSync(join(WEB_DIST, 'index.html'))).toBe(true); // npm test builds it first
    const home = await testApp.http().get('/').expect(200);
    expect(home.text).toContain('<div id="root">');
    const clientRoute = await testApp.http().get('/status').expect(200);
    expect(clientRoute.text).toBe(home.text);
  });
});
