import 'reflect-metadata';
import type { INestApplication } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import type { Server } from 'node:http';
import { join } from 'node:path';
import request from 'supertest';
import { createApp } from '../../../services/api/src/app.factory';

export interface TestApp {
  app: NestExpressApplication;
  http: () => ReturnType<typeof request>;
  close: () => Promise<void>;
}

/**
 * The whole API as production builds it, on the throwaway MariaDB and Redis that `npm test`
 * started. `overrides` change environment variables for this app only.
 */
export async function startTestApp(overrides: Record<string, string> = {}): Promise<TestApp> {
  const saved = Object.fromEntries(Object.keys(overrides).map((key) => [key, process.env[key]]));
  Object.assign(process.env, overrides);
  let app: NestExpressApplication;
  try {
    app = await createApp();
    await app.init();
  } finally {
    for (const [key, value] of Object.entries(saved)) {
      if (value === undefined) delete process.env[key];
      else process.env[key] = value;
    }
  }
  return {
    app,
    http: () => request((app as INestApplication).getHttpServer() as Server),
    close: () => app.close(),
  };
}

/** A short unique suffix so each test owns its rows in the shared test database. */
export function uniqueSuffix(): string {
  return `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`.toUpperCase();
}

/** The built web app: `npm test` builds it into a folder of its own run; else `npm run build`'s. */
export const WEB_DIST =
  process.env.WEB_DIST_DIR ?? join(__dirname, '..', '..', '..', 'packages', 'web', 'dist');
