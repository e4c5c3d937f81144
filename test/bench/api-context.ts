import type { DynamicModule, INestApplicationContext, Type } from '@nestjs/common';
import 'reflect-metadata';

const DIST = '../../services/api/dist';

/**
 * A Nest application context of the compiled API (tsx emits no decorator metadata, so the
 * benchmark loads `services/api/dist`). Job processors are off unless a section needs one of
 * their modules' providers (the export producers live beside the exports processor).
 */
export async function apiContext({ processors = false } = {}): Promise<INestApplicationContext> {
  process.env.JOB_PROCESSORS = processors ? 'in-process' : 'off';
  const { NestFactory } = await import('@nestjs/core');
  const { AppModule } = (await import(`${DIST}/app.module.js`)) as {
    AppModule: { forRoot(): DynamicModule };
  };
  return NestFactory.createApplicationContext(AppModule.forRoot(), { logger: ['error'] });
}

/** A class exported by a compiled API file, e.g. apiClass('reports/snapshot-builder.service', 'SnapshotBuilder'). */
export async function apiExport<T>(file: string, name: string): Promise<T> {
  const module = (await import(`${DIST}/${file}.js`)) as Record<string, unknown>;
  if (!(name in module)) throw new Error(`${file} exports no ${name}`);
  return module[name] as T;
}

export type { Type };
